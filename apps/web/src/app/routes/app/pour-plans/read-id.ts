import { Id } from '@gelpoint/contracts';
import { data } from 'react-router';

/** Not an id at all gets the same answer as an id that does not exist, without asking the API. */
export function readId(params: Record<string, string | undefined>, name: string, what: string): string {
  const parsed = Id.safeParse(params[name]);
  if (!parsed.success) throw data(`No such ${what}`, { status: 404 });
  return parsed.data;
}
