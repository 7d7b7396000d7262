import type { ReactNode } from 'react';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';

/** The title of a page before sign-in: its tab name and its one <h1>. */
export function PublicHeading({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-col gap-2">
      <DocumentTitle title={title} />
      <h1 className="text-3xl font-bold text-walnut-900">{title}</h1>
      {children ? <p className="text-lg text-ink-soft">{children}</p> : null}
    </div>
  );
}
