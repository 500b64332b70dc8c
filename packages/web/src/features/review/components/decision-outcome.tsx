import { Notice } from '../../../components/notice';

export interface Outcome {
  tone: 'sage' | 'brick';
  text: string;
}

/** The result of a decision, read out when it appears: sage for done, brick for refused. */
export function DecisionOutcome({ outcome }: { outcome: Outcome }) {
  return <Notice tone={outcome.tone}>{outcome.text}</Notice>;
}
