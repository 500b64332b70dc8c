import { List, Text } from '@chakra-ui/react';
import type { AuditAction, AuditEntry } from '../api/types';

const VERB: Record<AuditAction, string> = {
  moderator_granted: 'made {subject} a moderator',
  moderator_revoked: 'took the moderator role from {subject}',
  admin_granted: 'made {subject} an admin',
  admin_revoked: 'took the admin role from {subject}',
  suspended: 'suspended {subject}',
  restored: 'restored {subject}',
  revision_published: 'published {revision} by {subject}',
  revision_sent_back: 'sent {revision} back to {subject}',
  revision_declined: 'declined {revision} by {subject}',
  revision_hidden: 'hid {revision} by {subject}',
  revision_unhidden: 'restored {revision} by {subject}',
};

function sentence(entry: AuditEntry): string {
  const revision = entry.revision ? `r${entry.revision.number} of “${entry.revision.planTitle}”` : 'a revision';
  return VERB[entry.action].replace('{subject}', entry.subject.displayName).replace('{revision}', revision);
}

const timeFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

/** The newest role and status changes and review decisions: who did what to whom, and when. */
export function AuditLogList({ entries }: { entries: AuditEntry[] }) {
  if (entries.length === 0) return <Text color="fg.muted">No role or status has been changed yet.</Text>;
  return (
    <List.Root gap="2" variant="plain" aria-label="Recent role and status changes">
      {entries.map((entry) => (
        <List.Item key={entry.id} display="block">
          <Text as="span" fontWeight="500">
            {entry.actor ? entry.actor.displayName : 'Site configuration'}
          </Text>{' '}
          {sentence(entry)}
          <Text as="span" color="fg.muted" fontSize="sm" className="numeric">
            {' '}
            · {timeFormat.format(new Date(entry.at))}
          </Text>
        </List.Item>
      ))}
    </List.Root>
  );
}
