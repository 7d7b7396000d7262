import { useSearchParams } from 'react-router';
import { landingPath } from '../../../config/paths';
import { safeReturnTo } from '../../../lib/return-to';

/** The page to go back to after signing in, from `?returnTo=`, kept on this site. */
export function useReturnTo(): string {
  const [searchParams] = useSearchParams();
  return safeReturnTo(searchParams.get('returnTo'), landingPath);
}
