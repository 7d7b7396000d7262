import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { useSearchParams } from 'react-router';
import { Alert } from '../../../components/ui/Alert';
import { TextLink } from '../../../components/ui/TextLink';
import { paths, type SignInNotice } from '../../../config/paths';
import { SignInForm } from '../../../features/auth/components/SignInForm';
import { useReturnTo } from '../../../features/auth/hooks/use-return-to';
import { useSessionControl } from '../../session-control';
import { skipIfSignedIn } from '../../session-loaders';
import { PublicHeading } from './public-heading';

export const createLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) =>
    skipIfSignedIn(queryClient, request);

const notices: Record<SignInNotice, { tone: 'success' | 'info'; text: string }> = {
  'password-changed': { tone: 'success', text: 'Your password is changed. Sign in with the new one.' },
  'session-ended': { tone: 'info', text: 'Your session ended. Sign in again and Gelpoint takes you back to where you were.' },
  'signed-out': { tone: 'info', text: 'You are signed out. See you at the bench.' },
};

function isNotice(value: string | null): value is SignInNotice {
  return value !== null && value in notices;
}

export function Component() {
  const [searchParams] = useSearchParams();
  const returnTo = useReturnTo();
  const control = useSessionControl();
  const noticeKey = searchParams.get('notice');
  const notice = isNotice(noticeKey) ? notices[noticeKey] : null;

  return (
    <>
      <PublicHeading title="Sign in">Your shop&apos;s pieces, pours and cure board are waiting.</PublicHeading>
      {notice ? (
        <Alert tone={notice.tone} className="mb-5" live="none">
          {notice.text}
        </Alert>
      ) : null}
      <SignInForm onSignedIn={() => control.signedIn(returnTo)} />
      <div className="mt-6 flex flex-col gap-1 border-t border-line pt-4">
        <TextLink to={paths.forgotPassword.getHref()}>Forgot password?</TextLink>
        <p className="text-ink-soft">
          New to Gelpoint? <TextLink to={paths.createShop.getHref()}>Create a shop</TextLink>
        </p>
      </div>
    </>
  );
}
