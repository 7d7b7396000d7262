import { ResetToken } from '@gelpoint/contracts';
import { useNavigate, useSearchParams } from 'react-router';
import { Alert } from '../../../components/ui/Alert';
import { TextLink } from '../../../components/ui/TextLink';
import { paths } from '../../../config/paths';
import { ResetPasswordForm } from '../../../features/auth/components/ResetPasswordForm';
import { PublicHeading } from './public-heading';

export function Component() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const token = ResetToken.safeParse(searchParams.get('token'));

  return (
    <>
      <PublicHeading title="Choose a new password" />
      {token.success ? (
        <ResetPasswordForm token={token.data} onChanged={() => navigate(paths.signIn.getHref({ notice: 'password-changed' }), { replace: true })} />
      ) : (
        <Alert tone="warning" title="This link is not complete" live="none">
          Open the link from the e-mail again, all of it. If it still fails, ask for a new one.
        </Alert>
      )}
      <p className="mt-6 border-t border-line pt-4 text-ink-soft">
        Link expired or used already? <TextLink to={paths.forgotPassword.getHref()}>Ask for a new one</TextLink>
      </p>
    </>
  );
}
