import { TextLink } from '../../../components/ui/TextLink';
import { paths } from '../../../config/paths';
import { ForgotPasswordForm } from '../../../features/auth/components/ForgotPasswordForm';
import { PublicHeading } from './public-heading';

export function Component() {
  return (
    <>
      <PublicHeading title="Reset your password">Gelpoint e-mails you a link to choose a new one.</PublicHeading>
      <ForgotPasswordForm />
      <p className="mt-6 border-t border-line pt-4 text-ink-soft">
        Remembered it? <TextLink to={paths.signIn.getHref()}>Back to sign in</TextLink>
      </p>
    </>
  );
}
