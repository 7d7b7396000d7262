import { Outlet } from 'react-router';
import { PublicLayout } from '../../../components/layouts/PublicLayout';

export function Component() {
  return (
    <PublicLayout>
      <Outlet />
    </PublicLayout>
  );
}
