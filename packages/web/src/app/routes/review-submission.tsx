import { Link, Text } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import {
  data,
  Link as RouterLink,
  useNavigate,
  useParams,
  useSearchParams,
  type LoaderFunctionArgs,
} from 'react-router';
import { Page } from '../../components/page';
import { paths } from '../../config/paths';
import { requireMember } from '../../features/auth/require-member';
import { canReview } from '../../features/auth/roles';
import { planQueryOptions, usePlan } from '../../features/plans/api/get-plan';
import { revisionQueryOptions, useRevision } from '../../features/plans/api/get-revision';
import { PlanPage } from '../../features/plans/components/plan-page';
import { parseUnits } from '../../features/plans/units';
import { submissionQueryOptions, useSubmission } from '../../features/review/api/get-submission';
import { ReviewDecisions } from '../../features/review/components/review-decisions';
import { SubmissionDecisions } from '../../features/review/components/submission-decisions';
import { formatDateTime } from '../../features/review/wording';

function addressOf(params: Readonly<Record<string, string | undefined>>) {
  return { slug: params.slug ?? '', number: Number(params.number) };
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    const member = await requireMember(queryClient, request);
    if (!canReview(member))
      throw data('The review desk is for moderators.', {
        status: 403,
        statusText: 'The review desk is for moderators.',
      });
    const { slug, number } = addressOf(params);
    if (!Number.isInteger(number) || number < 1) throw data('No such revision.', { status: 404 });
    // The page shows what it can of these; a failure is shown there rather than thrown here.
    await Promise.allSettled([
      queryClient.ensureQueryData(submissionQueryOptions(slug, number)),
      queryClient.ensureQueryData(planQueryOptions(slug)),
      queryClient.ensureQueryData(revisionQueryOptions(slug, number)),
    ]);
    return null;
  };

/** One submission on the review desk: its checklist and decisions above the revision in full, as the plan page shows it. */
export default function ReviewSubmissionRoute() {
  const { slug, number } = addressOf(useParams());
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const submission = useSubmission(slug, number);
  const plan = usePlan(slug);
  const revision = useRevision(slug, number);
  const units = parseUnits(params.get('units'));
  const back = (
    <Link asChild color="steel.700">
      <RouterLink to={paths.reviewDesk.getHref()}>Back to the review desk</RouterLink>
    </Link>
  );

  const failed = submission.error ?? plan.error ?? revision.error;
  if (failed)
    return (
      <Page title="This submission cannot be shown" actions={back}>
        <Text role="alert">{failed.message}</Text>
      </Page>
    );
  if (!submission.data || !plan.data || !revision.data) return <Page title="Loading the submission…" />;
  const { designer } = submission.data.plan;
  return (
    <Page
      title={`${plan.data.title}, r${number}`}
      lead={`By ${designer.displayName}, submitted ${formatDateTime(submission.data.submittedAt)}.`}
      actions={back}
    >
      <SubmissionDecisions submission={submission.data} />
      <ReviewDecisions slug={slug} number={number} />
      <PlanPage
        plan={plan.data}
        revision={revision.data}
        units={units}
        onUnitsChange={(next) =>
          setParams(
            (current) => {
              const changed = new URLSearchParams(current);
              changed.set('units', next);
              return changed;
            },
            { replace: true, preventScrollReset: true },
          )
        }
        onShowRevision={(other) => navigate(`${paths.plan.getHref(slug)}?r=${other}`)}
      />
    </Page>
  );
}
