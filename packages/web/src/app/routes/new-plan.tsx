import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, type LoaderFunctionArgs } from 'react-router';
import { Page } from '../../components/page';
import { paths } from '../../config/paths';
import { requireMember } from '../../features/auth/require-member';
import { CreatePlanForm } from '../../features/publishing/components/create-plan-form';
import { planVocabulary } from './plan-vocabulary';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireMember(queryClient, request);
    return null;
  };

export default function NewPlanRoute() {
  const navigate = useNavigate();
  return (
    <Page
      title="New plan"
      lead="Start with what the jig is. Its first revision, r1, is a draft only you see until you submit it for review."
    >
      <CreatePlanForm
        vocabulary={planVocabulary}
        onCreated={(plan) => navigate(paths.revisionEditor.getHref(plan.slug, plan.revisions.at(-1)?.number ?? 1))}
        onCancel={() => navigate(paths.workshop.getHref())}
      />
    </Page>
  );
}
