import { Text } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Page } from '../../components/page';
import { paths } from '../../config/paths';
import { planQueryOptions, usePlan } from '../../features/plans/api/get-plan';
import { revisionQueryOptions, useRevision } from '../../features/plans/api/get-revision';
import type { PlanDetail } from '../../features/plans/api/types';
import { SavedIndexingSet } from '../../features/calculators/finger-joints/components/saved-indexing-set';
import { PlanPage } from '../../features/plans/components/plan-page';
import { formatLength, parseUnits } from '../../features/plans/units';
import { useMe } from '../../features/auth/api/get-me';
import { canReview } from '../../features/auth/roles';
import { RevisionModeration } from '../../features/review/components/revision-moderation';
import { useShopProfile } from '../../features/settings/api/shop-profile';
import { ShopProfileNote } from '../../features/settings/components/shop-profile-note';
import { cutListOptionsOf } from '../../features/settings/shop-profile-options';
import { OwnerPlanActions } from '../../features/publishing/components/owner-plan-actions';

/** The revision the address asks for, else the latest published one, else the newest. */
function shownRevision(plan: PlanDetail, asked: string | null): number | null {
  const numbers = plan.revisions.map((revision) => revision.number);
  const wanted = Number(asked);
  if (numbers.includes(wanted)) return wanted;
  return plan.latestRevision?.number ?? numbers.at(-1) ?? null;
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    const slug = params.slug ?? '';
    const plan = await queryClient.fetchQuery(planQueryOptions(slug)).catch(() => null);
    const number = plan && shownRevision(plan, new URL(request.url).searchParams.get('r'));
    if (number) await queryClient.prefetchQuery(revisionQueryOptions(slug, number));
    return null;
  };

export default function PlanRoute() {
  const { slug = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const plan = usePlan(slug);
  const number = plan.data ? shownRevision(plan.data, params.get('r')) : null;
  const revision = useRevision(slug, number);
  const { data: member } = useMe();
  const shop = useShopProfile(member?.login);
  // The address wins (a shared link keeps its units); else the member's own units.
  const units = parseUnits(params.get('units') ?? member?.units ?? null);
  const shopProfile = shop.data?.saved ? shop.data : undefined;
  const parts = revision.data?.parts;
  const cutListOptions = useMemo(
    () =>
      shopProfile && parts
        ? cutListOptionsOf(shopProfile, [...new Set(parts.map((part) => part.material))])
        : undefined,
    [shopProfile, parts],
  );
  const setParam = (name: string, value: string) =>
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        next.set(name, value);
        return next;
      },
      { replace: name === 'units', preventScrollReset: true },
    );

  if (plan.isError) {
    return (
      <Page title="Plan not found">
        <Text role="alert">{plan.error.message}</Text>
      </Page>
    );
  }
  if (!plan.data) return <Page title="Loading the plan…" />;
  return (
    <Page
      title={plan.data.title}
      lead={plan.data.summary}
      actions={
        plan.data.viewerIsOwner && (
          <OwnerPlanActions
            slug={slug}
            revisions={plan.data.revisions}
            editorHref={(n) => paths.revisionEditor.getHref(slug, n)}
            onStarted={(n) => navigate(paths.revisionEditor.getHref(slug, n))}
          />
        )
      }
    >
      {revision.isError && (
        <Text role="alert" color="brick.700">
          This revision could not be loaded: {revision.error.message}
        </Text>
      )}
      {number === null && <Text color="fg.muted">This plan has no revision to show yet.</Text>}
      {revision.data && (
        <PlanPage
          plan={plan.data}
          revision={revision.data}
          units={units}
          onUnitsChange={(next) => setParam('units', next)}
          onShowRevision={(n) => setParam('r', String(n))}
          actions={
            canReview(member) &&
            !plan.data.viewerIsOwner && (
              <RevisionModeration
                slug={slug}
                number={revision.data.number}
                state={revision.data.state}
                planTitle={plan.data.title}
                designerName={plan.data.designer.displayName}
                onDecided={() => setParam('r', String(revision.data.number))}
              />
            )
          }
          cutListOptions={cutListOptions}
          afterCutList={
            revision.data.indexing && (
              <SavedIndexingSet name={revision.data.indexing.name} inputs={revision.data.indexing.inputs} />
            )
          }
          currency={shopProfile?.currency}
          cutListNote={
            <ShopProfileNote profile={shop.data} signedIn={member != null} units={units} formatLength={formatLength} />
          }
        />
      )}
    </Page>
  );
}
