import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { TextLink } from '../../../components/ui/TextLink';
import { landingPath, paths } from '../../../config/paths';
import { CreateShopForm } from '../../../features/auth/components/CreateShopForm';
import { useSessionControl } from '../../session-control';
import { skipIfSignedIn } from '../../session-loaders';
import { PublicHeading } from './public-heading';

export const createLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) =>
    skipIfSignedIn(queryClient, request);

export function Component() {
  const control = useSessionControl();
  return (
    <>
      <PublicHeading title="Create a shop">You become its shop lead and can invite makers and apprentices next.</PublicHeading>
      <CreateShopForm onCreated={() => control.signedIn(landingPath)} />
      <p className="mt-6 border-t border-line pt-4 text-ink-soft">
        Already have an account? <TextLink to={paths.signIn.getHref()}>Sign in</TextLink>
      </p>
    </>
  );
}
