import { type QueryClient, useQuery } from '@tanstack/react-query';
import { useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { SafetyNote } from '../../../../components/ui/SafetyNote';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { planChoicesQueryOptions, usePlanChoices } from '../../../../features/pours/api/get-plan-choices';
import { StartPourForm } from '../../../../features/pours/components/StartPourForm';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { useShop } from '../../../../features/shop/api/get-shop';
import { membersQueryOptions, shopQueryOptions } from '../../../../lib/resources/shop';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    await Promise.all([
      queryClient.ensureQueryData(planChoicesQueryOptions()),
      queryClient.ensureQueryData(membersQueryOptions()),
      queryClient.ensureQueryData(shopQueryOptions()),
    ]);
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const plans = usePlanChoices();
  const members = useQuery(membersQueryOptions());
  const shop = useShop();

  return (
    <>
      <DocumentTitle title="Start a pour" />
      <PageHeader
        title="Start a pour"
        description="Choose the plan to pour; its cups become the run sheet, and the cure clock starts with the first one logged."
      />
      <div className="flex flex-col gap-6">
        <Card className="max-w-3xl">
          <QueryResult query={plans} loadingLabel="Loading the pour plans…">
            {(planList) => (
              <QueryResult query={members} loadingLabel="Loading the team…">
                {(memberList) => (
                  <QueryResult query={shop} loadingLabel="Loading the shop’s units…">
                    {(units) => (
                      <StartPourForm
                        plans={planList.items}
                        members={memberList}
                        selfUserId={session.user.id}
                        preselectedPlanId={search.get('planId')}
                        unitSystem={units.unitSystem}
                        onStarted={(pour) => navigate(paths.pour.getHref(pour.id), { replace: true })}
                      />
                    )}
                  </QueryResult>
                )}
              </QueryResult>
            )}
          </QueryResult>
        </Card>
        <SafetyNote />
      </div>
      <p className="mt-6">
        <TextLink to={paths.cureBoard.getHref()}>Back to the cure board</TextLink>
      </p>
    </>
  );
}
