import type { QueryClient } from '@tanstack/react-query';
import { useEffect, type ReactNode } from 'react';
import { Link, Outlet, useNavigation, type LoaderFunctionArgs } from 'react-router';
import { AppFrame } from '../../../components/layouts/AppFrame';
import { AuditIcon, CureBoardIcon, MouldsIcon, PiecesIcon, PourPlanIcon, SettingsIcon, ShelfIcon, TeamIcon, TodayIcon } from '../../../components/ui/icons';
import { PageSpinner } from '../../../components/ui/PageSpinner';
import { useSession } from '../../../features/auth/api/get-session';
import { authKeys } from '../../../lib/resources/session';
import { OfflineNotice } from '../../../features/offline/components/OfflineNotice';
import { OutboxPanel } from '../../../features/offline/components/OutboxPanel';
import { ShopSwitcher } from '../../../features/auth/components/ShopSwitcher';
import { SignOutButton } from '../../../features/auth/components/SignOutButton';
import { paths } from '../../../config/paths';
import { roleLabel } from '../../../lib/roles';
import { navigationFor, type NavKey } from '../../navigation';
import { useSessionControl } from '../../session-control';
import { requireSession } from '../../session-loaders';
import { SignedInSessionProvider } from '../../signed-in-session';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    return null;
  };

const navIcons: Record<NavKey, ReactNode> = {
  today: <TodayIcon />,
  pieces: <PiecesIcon />,
  moulds: <MouldsIcon />,
  pourPlans: <PourPlanIcon />,
  cureBoard: <CureBoardIcon />,
  shelf: <ShelfIcon />,
  team: <TeamIcon />,
  audit: <AuditIcon />,
  shopSettings: <SettingsIcon />,
};

export function Component() {
  const { data: session } = useSession();
  const control = useSessionControl();
  const navigation = useNavigation();

  // The session can end while a page is open (a refetch answers "nobody"); then sign in again and come back.
  useEffect(() => {
    if (session === null) control.expired();
  }, [session, control]);

  if (!session) return <PageSpinner label="Checking who is signed in…" />;

  return (
    <SignedInSessionProvider session={session}>
      <AppFrame
        navigation={navigationFor(session.role).map((item) => ({ href: item.href, label: item.label, icon: navIcons[item.key] }))}
        shopArea={<ShopSwitcher key={session.shop.id} session={session} onSwitched={() => control.shopSwitched()} />}
        account={
          <div className="flex flex-wrap items-center justify-between gap-3 md:justify-end">
            <Link to={paths.account.getHref()} className="flex min-h-touch flex-col justify-center leading-tight hover:text-resin-200">
              <span className="sr-only">Your account: </span>
              <span className="font-semibold underline decoration-resin-400 decoration-2 underline-offset-4">{session.user.name}</span>
              <span className="text-sm text-walnut-200">{roleLabel(session.role)}</span>
            </Link>
            <SignOutButton onSignedOut={() => control.signedOut()} />
          </div>
        }
        busy={navigation.state === 'loading'}
      >
        <OfflineNotice pageLoading={navigation.state === 'loading'} notPageData={authKeys.session()} />
        <OutboxPanel />
        <Outlet />
      </AppFrame>
    </SignedInSessionProvider>
  );
}
