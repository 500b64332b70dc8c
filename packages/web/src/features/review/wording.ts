import type { ReviewDecisionKind, ReviewDecisionResult, RevisionState } from './api/types';

const dateTime = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short', timeZone: 'UTC' });

/** "2 Dec 2026, 00:40 UTC" */
export function formatDateTime(iso: string): string {
  return `${dateTime.format(new Date(iso))} UTC`;
}

export const stateWord = (state: RevisionState) => state.replace('-', ' ');

export interface DecisionWording {
  /** The button that starts it. */
  action: string;
  title: (what: string) => string;
  body: string;
  notesLabel: string;
  notesRequired: boolean;
  /** Shown when required notes are left empty. */
  missingNotes: string;
  confirm: string;
  destructive: boolean;
  done: (what: string) => string;
}

export const DECISIONS: Record<ReviewDecisionKind, DecisionWording> = {
  publish: {
    action: 'Publish',
    title: (what) => `Publish ${what}?`,
    body: 'It goes into the library at once as the plan’s latest revision, and the designer is e-mailed.',
    notesLabel: 'A note to the designer (optional)',
    notesRequired: false,
    missingNotes: '',
    confirm: 'Publish',
    destructive: false,
    done: (what) => `${what} is published and in the library.`,
  },
  'send-back': {
    action: 'Send back',
    title: (what) => `Send ${what} back to its designer?`,
    body: 'The designer can edit it again and submit it once more. Say what to change: they read your notes in their editor and in the e-mail.',
    notesLabel: 'What to change',
    notesRequired: true,
    missingNotes: 'Write what the designer should change.',
    confirm: 'Send back',
    destructive: false,
    done: (what) => `${what} is sent back to its designer with your notes.`,
  },
  decline: {
    action: 'Decline',
    title: (what) => `Decline ${what}?`,
    body: 'It will not be published and cannot be edited again. Say why: the designer reads your notes in the e-mail and in their workshop.',
    notesLabel: 'Why it is declined',
    notesRequired: true,
    missingNotes: 'Write why this revision is declined.',
    confirm: 'Decline',
    destructive: true,
    done: (what) => `${what} is declined.`,
  },
  hide: {
    action: 'Hide this revision',
    title: (what) => `Hide ${what}?`,
    body: 'Visitors and the library stop showing it at once: the plan shows its latest other published revision, or leaves the library if it has none. The designer is told the reason.',
    notesLabel: 'Reason',
    notesRequired: true,
    missingNotes: 'Give the reason for hiding this revision.',
    confirm: 'Hide revision',
    destructive: true,
    done: (what) => `${what} is hidden: visitors no longer see it.`,
  },
  unhide: {
    action: 'Restore',
    title: (what) => `Restore ${what}?`,
    body: 'Everyone can read it again, with the date it was first published, and the designer is e-mailed.',
    notesLabel: 'A note to the designer (optional)',
    notesRequired: false,
    missingNotes: '',
    confirm: 'Restore',
    destructive: false,
    done: (what) => `${what} is restored: everyone can read it again.`,
  },
};

/** What became of the designer's e-mail, in a sentence. */
export function mailSentence(mail: ReviewDecisionResult['mail'], designerName: string): string {
  switch (mail) {
    case 'sent':
      return `${designerName} was e-mailed.`;
    case 'failed':
      return `The e-mail to ${designerName} could not be sent; the decision stands.`;
    case 'not-wanted':
      return `${designerName} has e-mails about review decisions turned off.`;
  }
}
