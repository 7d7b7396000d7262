import { Spinner } from './Spinner';

export function PageSpinner({ label = 'Loading…' }: { label?: string }) {
  return (
    <div className="flex min-h-48 items-center justify-center text-walnut-600">
      <Spinner size="lg" label={label} />
    </div>
  );
}
