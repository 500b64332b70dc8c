import { Link, Text } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { Page } from '../../components/page';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { requireMember } from '../../features/auth/require-member';
import { NotesMarkdown } from '../../features/plans/components/notes-markdown';
import { editorRevisionQueryOptions, useEditorRevision } from '../../features/publishing/api/get-editor-revision';
import { ownPlanQueryOptions, useOwnPlan } from '../../features/publishing/api/get-own-plan';
import { RevisionEditor } from '../../features/publishing/components/revision-editor';
import { ReviewDecisions } from '../../features/review/components/review-decisions';
import { planVocabulary } from './plan-vocabulary';

const renderMarkdown = (text: string) => <NotesMarkdown text={text} />;

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireMember(queryClient, request);
    const slug = params.slug ?? '';
    const number = Number(params.number);
    await Promise.all([
      queryClient.prefetchQuery(ownPlanQueryOptions(slug)),
      Number.isInteger(number) && number > 0 && queryClient.prefetchQuery(editorRevisionQueryOptions(slug, number)),
    ]);
    return null;
  };

export default function RevisionEditorRoute() {
  const { slug = '', number: numberParam } = useParams();
  const number = Number(numberParam);
  const navigate = useNavigate();
  const { data: member } = useMe();
  const plan = useOwnPlan(slug);
  const revision = useEditorRevision(slug, Number.isInteger(number) && number > 0 ? number : 0);

  const problem = plan.error ?? revision.error;
  if (problem || (plan.data && !plan.data.viewerIsOwner)) {
    return (
      <Page title="This revision cannot be edited here">
        <Text role="alert">
          {problem?.message ?? 'Only the plan’s designer edits its revisions.'}{' '}
          <Link asChild color="steel.700">
            <RouterLink to={paths.workshop.getHref()}>Back to My workshop</RouterLink>
          </Link>
        </Text>
      </Page>
    );
  }
  if (!plan.data || !revision.data || !member) return <Page title="Loading the revision…" />;
  return (
    <Page
      title={plan.data.title}
      lead={
        <>
          Revision r{number} ·{' '}
          <Link asChild color="steel.700">
            <RouterLink to={paths.workshop.getHref()}>My workshop</RouterLink>
          </Link>
        </>
      }
    >
      <RevisionEditor
        key={`${slug}/${number}`}
        plan={plan.data}
        revision={revision.data}
        units={member.units}
        vocabulary={planVocabulary}
        renderMarkdown={renderMarkdown}
        reviewNotes={
          (revision.data.state === 'sent-back' || revision.data.state === 'declined') && (
            <ReviewDecisions slug={slug} number={number} />
          )
        }
        planHref={`${paths.plan.getHref(slug)}?r=${number}`}
        onReload={() => revision.refetch()}
        onDeleted={() => navigate(paths.workshop.getHref())}
        onStarted={(next) => navigate(paths.revisionEditor.getHref(slug, next))}
      />
    </Page>
  );
}
