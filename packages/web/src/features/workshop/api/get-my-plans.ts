import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type RevisionState = 'draft' | 'submitted' | 'published' | 'sent-back' | 'declined' | 'hidden';

/** `GET /api/me/plans` (the server's `MyPlanPageDto`), only the fields My workshop shows. */
export interface MyPlan {
  slug: string;
  title: string;
  summary: string;
  category: string;
  latestRevision: { number: number; publishedAt: string } | null;
  /** Oldest first. */
  revisions: Array<{ number: number; state: RevisionState; publishedAt: string | null; updatedAt: string }>;
  updatedAt: string;
}

export interface MyPlansPage {
  items: MyPlan[];
  total: number;
  page: number;
  pageSize: number;
}

/** The designer's screens invalidate this key after every change to a plan or revision. */
export const myPlansQueryKey = (page: number) => ['me', 'plans', page] as const;

export const myPlansQueryOptions = (page: number) =>
  queryOptions({
    queryKey: myPlansQueryKey(page),
    queryFn: () => api<MyPlansPage>(`/me/plans?page=${page}&pageSize=20`),
  });

export function useMyPlans(page: number) {
  return useQuery(myPlansQueryOptions(page));
}
