/**
 * The review API's response shapes, mirrored from the server's DTOs
 * (`packages/server/src/review/dto/review.dto.ts`): the web app never imports server code.
 */

export type RevisionState = 'draft' | 'submitted' | 'published' | 'sent-back' | 'declined' | 'hidden';

export interface MemberRef {
  id: number;
  login: string;
  displayName: string;
  avatarUrl: string | null;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export type ReviewCheckName = 'drawing' | 'cut-list' | 'safety-notes' | 'licence';

export interface ReviewCheck {
  check: ReviewCheckName;
  label: string;
  ok: boolean;
  /** What was found, passed or not. */
  summary: string;
  /** Each problem found; empty when the check passed. */
  problems: string[];
}

export interface Submission {
  plan: {
    slug: string;
    title: string;
    designer: MemberRef;
    category: string;
    motorised: boolean;
    tools: string[];
    licence: string;
  };
  number: number;
  state: RevisionState;
  submittedAt: string;
  changelog: string;
  /** The plan is the signed-in moderator's own: another moderator decides on it. */
  ownPlan: boolean;
  checklist: ReviewCheck[];
}

export type ReviewDecisionKind = 'publish' | 'send-back' | 'decline' | 'hide' | 'unhide';

export interface ReviewDecision {
  id: number;
  decision: ReviewDecisionKind;
  notes: string;
  moderator: MemberRef | null;
  at: string;
}

export interface ReviewDecisionResult {
  decision: ReviewDecision;
  revision: { number: number; state: RevisionState; changelog: string; publishedAt: string | null; updatedAt: string };
  /** The designer's e-mail: sent, failed (the decision stands), or not wanted (their settings). */
  mail: 'sent' | 'failed' | 'not-wanted';
}
