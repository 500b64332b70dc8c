import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useDecide } from '../api/decide';
import type { ReviewDecisionKind } from '../api/types';
import { DECISIONS, mailSentence } from '../wording';
import type { Outcome } from './decision-outcome';

export interface PendingDecision {
  decision: ReviewDecisionKind;
  /** "r2 of “Crosscut sled”" */
  what: string;
}

/** The server's words for a refusal, with the fields a validation failure lists. */
function refusalText(error: Error): string {
  if (error instanceof ApiError && Array.isArray(error.details) && error.details.length > 0)
    return error.details.map(String).join(' ');
  return error.message;
}

export type DecisionState = ReturnType<typeof useDecision>;

/** One revision's decisions: which one is being confirmed, sending it, and what came of it. */
export function useDecision({
  slug,
  number,
  what,
  designerName,
  onDecided,
}: {
  slug: string;
  number: number;
  what: string;
  designerName: string;
  /** After the decision is stored, before the pages showing the revision are read again. */
  onDecided?: () => void;
}) {
  const decide = useDecide();
  const [pending, setPending] = useState<PendingDecision | null>(null);
  const [outcome, setOutcome] = useState<Outcome | null>(null);

  return {
    pending,
    outcome,
    busy: decide.isPending,
    error: decide.error ? refusalText(decide.error) : null,
    start(decision: ReviewDecisionKind) {
      decide.reset();
      setOutcome(null);
      setPending({ decision, what });
    },
    cancel() {
      setPending(null);
    },
    confirm(text: string) {
      if (!pending) return;
      const { decision } = pending;
      decide.mutate(
        { slug, number, decision, text },
        {
          onSuccess: (result) => {
            onDecided?.();
            setPending(null);
            setOutcome({
              tone: 'sage',
              text: `${DECISIONS[decision].done(what)} ${mailSentence(result.mail, designerName)}`,
            });
          },
        },
      );
    },
  };
}
