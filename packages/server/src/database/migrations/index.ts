import { CreateMembers1764626400000 } from './1764626400000-CreateMembers';

/** Committed migrations in order; a committed migration is never rewritten. */
export const migrations = [CreateMembers1764626400000];
