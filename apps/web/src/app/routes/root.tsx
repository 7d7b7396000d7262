import { Outlet, ScrollRestoration } from 'react-router';
import { PageSpinner } from '../../components/ui/PageSpinner';

export function RootLayout() {
  return (
    <>
      <Outlet />
      <ScrollRestoration />
    </>
  );
}

/** Shown while the first loaders run, i.e. while Gelpoint asks the API who is signed in. */
export function RootHydrateFallback() {
  return (
    <div className="flex min-h-dvh items-center justify-center bg-paper">
      <PageSpinner label="Opening Gelpoint…" />
    </div>
  );
}
