import type { OutgoingMail } from '../mail/mail.service';
import type { ReviewDecisionKind } from './entities/review-decision.entity';

export interface DecisionMailFacts {
  decision: ReviewDecisionKind;
  designerName: string;
  designerEmail: string;
  moderatorName: string;
  planTitle: string;
  number: number;
  notes: string;
  /** Where the revision can be read (published, restored), edited (sent back), and where the designer's plans are. */
  revisionUrl: string;
  editorUrl: string;
  workshopUrl: string;
}

const HEADLINE: Record<ReviewDecisionKind, (facts: DecisionMailFacts) => string> = {
  publish: ({ number, planTitle }) => `r${number} of “${planTitle}” is published`,
  'send-back': ({ number, planTitle }) => `r${number} of “${planTitle}” is sent back to you`,
  decline: ({ number, planTitle }) => `r${number} of “${planTitle}” is declined`,
  hide: ({ number, planTitle }) => `r${number} of “${planTitle}” is hidden`,
  unhide: ({ number, planTitle }) => `r${number} of “${planTitle}” is shown again`,
};

const BODY: Record<ReviewDecisionKind, (facts: DecisionMailFacts) => string> = {
  publish: ({ moderatorName, revisionUrl }) =>
    `${moderatorName} published it on the review desk. It is in the library now:\n${revisionUrl}`,
  'send-back': ({ moderatorName, editorUrl }) =>
    `${moderatorName} looked at it on the review desk and sent it back for changes. Their notes are below. ` +
    `You can edit the revision again and submit it once more:\n${editorUrl}`,
  decline: ({ moderatorName, workshopUrl }) =>
    `${moderatorName} looked at it on the review desk and declined it; it will not be published. Their notes are below. ` +
    `Your plans are in your workshop:\n${workshopUrl}`,
  hide: ({ moderatorName, workshopUrl }) =>
    `${moderatorName} hid it: visitors no longer see it, and the library shows your latest other published revision, if any. ` +
    `The reason is below. Your plans are in your workshop:\n${workshopUrl}`,
  unhide: ({ moderatorName, revisionUrl }) =>
    `${moderatorName} restored it: everyone can read it again.\n${revisionUrl}`,
};

const NOTES_HEADING: Record<ReviewDecisionKind, string> = {
  publish: 'A note from the moderator',
  'send-back': 'What to change',
  decline: 'Why',
  hide: 'The reason',
  unhide: 'A note from the moderator',
};

/** The e-mail that tells a designer what the review desk decided on their revision (plain text). */
export function decisionMail(facts: DecisionMailFacts): OutgoingMail {
  const notes = facts.notes.trim();
  const text = [
    `Hello ${facts.designerName},`,
    `${HEADLINE[facts.decision](facts)}.`,
    BODY[facts.decision](facts),
    ...(notes ? [`${NOTES_HEADING[facts.decision]}:\n\n${notes}`] : []),
    'You get this e-mail because of your settings on Jigwright; you can turn off e-mails about review decisions there.',
  ].join('\n\n');
  return { to: facts.designerEmail, subject: HEADLINE[facts.decision](facts), text: `${text}\n` };
}
