import { Member } from '../members/entities/member.entity';

/** Every entity, listed explicitly (no path globs), for the app and the migration CLI alike. */
export const entities = [Member];
