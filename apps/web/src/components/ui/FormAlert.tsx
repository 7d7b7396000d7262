import { Alert } from './Alert';

/** The form-level message after a failed submit; announced at once so nobody keeps waiting. */
export function FormAlert({ message, title = "That didn't work" }: { message: string | null; title?: string }) {
  if (!message) return null;
  return (
    <Alert tone="error" title={title} live="alert">
      {message}
    </Alert>
  );
}
