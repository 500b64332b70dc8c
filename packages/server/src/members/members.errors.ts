import { ConflictError, NotFoundError } from '../common/domain-error';

export class MemberNotFoundError extends NotFoundError {
  constructor(login: string) {
    super('member_not_found', `There is no member called ${login}.`);
  }
}

/** A role or status change that the rules do not allow (an admin cannot be suspended, say). */
export class MemberChangeRefusedError extends ConflictError {}
