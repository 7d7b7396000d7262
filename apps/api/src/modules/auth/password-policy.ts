import { dictionary } from '@zxcvbn-ts/language-common';
import { AppError } from '../../http/errors';

// OWASP ASVS 6.2.4: refuse passwords found in a list of common ones. The list ships with the app (the
// zxcvbn-ts common-passwords dictionary, about 49,000 entries), so no lookup leaves the machine.
let common: Set<string> | undefined;
const commonPasswords = () => (common ??= new Set(dictionary['passwords-common'].map((p) => p.toLowerCase())));

/** Length is checked by the request schema (8 to 200 characters); this checks what length cannot. */
export function checkNewPassword(password: string, person: { email: string; name?: string }): void {
  const lower = password.toLowerCase();
  const refuse = (why: string) => {
    throw new AppError('bad_request', 'weak_password', `choose another password: ${why}`, { password: why });
  };
  if (commonPasswords().has(lower)) refuse('it is on the list of commonly used passwords');
  const local = person.email.split('@')[0]!.toLowerCase();
  if (lower === person.email.toLowerCase() || (local.length >= 4 && lower.includes(local))) refuse('it contains your e-mail address');
  if (person.name && person.name.length >= 4 && lower === person.name.toLowerCase()) refuse('it is your name');
}
