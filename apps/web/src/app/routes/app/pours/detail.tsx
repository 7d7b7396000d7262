import { can, Id } from '@gelpoint/contracts';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { data, useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { Card } from '../../../../components/ui/Card';
import { DateTime } from '../../../../components/ui/DateTime';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { usePour } from '../../../../features/pours/api/get-pour';
import { pourQueryOptions } from '../../../../lib/resources/pours';
import { CureLog } from '../../../../features/pours/components/CureLog';
import { MachinedForm } from '../../../../features/pours/components/MachinedForm';
import { PourDownloads } from '../../../../features/pours/components/PourDownloads';
import { ReleaseButton } from '../../../../features/pours/components/ReleaseButton';
import { RunSheet } from '../../../../features/pours/components/RunSheet';
import { pourStatusWords } from '../../../../features/pours/utils/cure-words';
import { runSheetOf } from '../../../../features/pours/utils/plan-run-sheet';
import { pourPlanQueryOptions } from '../../../../lib/resources/pour-plans';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

function readPourId(params: Record<string, string | undefined>): string {
  const parsed = Id.safeParse(params.pourId);
  // Not an id at all: the same answer as an id that does not exist, without asking the API.
  if (!parsed.success) throw data('No such pour', { status: 404 });
  return parsed.data;
}

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const [pour] = await Promise.all([queryClient.ensureQueryData(pourQueryOptions(readPourId(params))), queryClient.ensureQueryData(shopQueryOptions())]);
    await queryClient.ensureQueryData(pourPlanQueryOptions(pour.pourPlanId));
    return null;
  };

export function Component() {
  const pourId = readPourId(useParams());
  const session = useSignedInSession();
  const pour = usePour(pourId);
  const planId = pour.data?.pourPlanId;
  const plan = useQuery({ ...pourPlanQueryOptions(planId ?? ''), enabled: planId !== undefined });
  const shop = useShop();

  return (
    <QueryResult query={pour} loadingLabel="Loading the pour…">
      {(current) => (
        <>
          <DocumentTitle title={`Pour: ${current.piece.name}`} />
          <PageHeader
            eyebrow="Pour"
            title={current.piece.name}
            description={
              <>
                {current.planName} · {pourStatusWords[current.status]} · started <DateTime iso={current.startedAt} />
              </>
            }
            actions={
              current.status === 'open' && current.cure.release.allowed && can(session.role, 'pour:release') ? (
                <ReleaseButton pourId={current.id} pieceName={current.piece.name} />
              ) : null
            }
          />
          <nav aria-label="On this page" className="mb-6 flex flex-wrap gap-x-6">
            <TextLink to="#run-sheet">Run sheet</TextLink>
            <TextLink to="#cure-log">Cure log</TextLink>
            <TextLink to={paths.pourPlan.getHref(current.pourPlanId)}>The pour plan</TextLink>
            <TextLink to={paths.piece.getHref(current.piece.id)}>The piece</TextLink>
            <TextLink to={paths.pieceRecord.getHref(current.piece.id)}>Cure record to print</TextLink>
            <PourDownloads pourId={current.id} />
          </nav>
          {current.status === 'released' ? (
            <Alert tone="success" live="none" className="mb-6" title="Released for machining">
              {current.releasedBy ? `${current.releasedBy.name} released it` : 'Released'}
              {current.releasedAt ? (
                <>
                  {' '}
                  <DateTime iso={current.releasedAt} />
                </>
              ) : null}
              .
            </Alert>
          ) : null}
          {current.status === 'released' && can(session.role, 'pour:machined') ? (
            <Card title="Machining done?" className="mb-6">
              <MachinedForm pourId={current.id} />
            </Card>
          ) : null}
          <QueryResult query={shop} loadingLabel="Loading the shop’s units…">
            {(units) => (
              <QueryResult query={plan} loadingLabel="Loading the run sheet…">
                {(savedPlan) => {
                  const sheet = runSheetOf(savedPlan);
                  if (!sheet.ok) {
                    return (
                      <Alert tone="error" title="The run sheet cannot be shown" live="none">
                        {sheet.error.message}
                      </Alert>
                    );
                  }
                  return (
                    <div className="flex flex-col gap-10">
                      <section aria-labelledby="run-sheet" className="flex flex-col gap-4">
                        <h2 id="run-sheet" className="scroll-mt-4 text-2xl font-bold text-walnut-900">
                          Run sheet
                        </h2>
                        <RunSheet pour={current} sheet={sheet.value} shop={units} viewer={{ userId: session.user.id, role: session.role }} />
                      </section>
                      <section aria-labelledby="cure-log" className="flex flex-col gap-4">
                        <h2 id="cure-log" className="scroll-mt-4 text-2xl font-bold text-walnut-900">
                          Cure log
                        </h2>
                        <CureLog pour={current} sheet={sheet.value} shop={units} viewer={{ userId: session.user.id, role: session.role }} />
                      </section>
                    </div>
                  );
                }}
              </QueryResult>
            )}
          </QueryResult>
          <p className="mt-8">
            <TextLink to={paths.cureBoard.getHref()}>Back to the cure board</TextLink>
          </p>
        </>
      )}
    </QueryResult>
  );
}
