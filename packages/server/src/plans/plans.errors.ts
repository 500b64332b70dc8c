import { PayloadTooLargeException, ServiceUnavailableException } from '@nestjs/common';
import { QueryFailedError } from 'typeorm';
import { ConflictError, DomainError, NotFoundError } from '../common/domain-error';

export class PlanNotFoundError extends NotFoundError {
  constructor(slug: string) {
    super('plan_not_found', `There is no plan called ${slug}.`);
  }
}

export class RevisionNotFoundError extends NotFoundError {
  constructor(slug: string, number: number) {
    super('revision_not_found', `Plan ${slug} has no revision r${number}.`);
  }
}

export class DrawingNotFoundError extends NotFoundError {
  constructor(id: number) {
    super('drawing_not_found', `This revision has no drawing ${id}.`);
  }
}

export class PartNotFoundError extends NotFoundError {
  constructor(id: number) {
    super('part_not_found', `This revision has no part ${id}.`);
  }
}

export class AttachmentNotFoundError extends NotFoundError {
  constructor(id: number) {
    super('attachment_not_found', `This revision has no attachment ${id}.`);
  }
}

/** A change the revision's state does not allow (editing a submitted revision, submitting a published one…). */
export class RevisionStateError extends ConflictError {}

/** Another tab (or person) saved this part after this editor loaded it. */
export class PartChangedError extends ConflictError {
  constructor(name: string) {
    super(
      'part_changed',
      `The part “${name}” was saved somewhere else (another tab or window) after you opened it. Reload it to see those changes, then make yours again.`,
    );
  }
}

/** Another tab (or person) saved the draft after this editor loaded it. */
export class PlanChangedError extends ConflictError {
  constructor() {
    super(
      'plan_changed',
      'This plan’s details were saved somewhere else (another tab or window) after you opened them. Reload to see those changes, then make yours again.',
    );
  }
}

export class RevisionChangedError extends ConflictError {
  constructor() {
    super(
      'revision_changed',
      'This draft was saved somewhere else (another tab or window) after you opened it. Reload it to see those changes, then make yours again.',
    );
  }
}

/** A revision that is not ready for review; `details` lists what is missing. */
export class SubmissionIncompleteError extends DomainError {
  constructor(missing: string[]) {
    super('invalid', 'revision_incomplete', `This revision is not ready to submit: ${missing.join(' ')}`, missing);
  }
}

/** An upload refused for what it is; the message says what to do instead. */
export class UploadRefusedError extends DomainError {
  constructor(code: string, message: string) {
    super('invalid', code, message);
  }
}

export class DuplicateUploadError extends ConflictError {
  constructor(kind: 'drawing' | 'attachment', existingName: string) {
    super(
      `duplicate_${kind}`,
      `This file is already on this revision, as ${existingName} (the same SHA-256). There is no need to upload it twice.`,
    );
  }
}

/** The file store did not take or give a file; nothing was kept. (503: the store, not the request, is at fault.) */
export class StorageUnavailableError extends ServiceUnavailableException {
  constructor() {
    super({
      code: 'storage_unavailable',
      message: 'The file store did not answer, so nothing was saved or changed. Try again in a moment.',
    });
  }
}

const MIB = 1024 * 1024;

export class FileTooLargeError extends PayloadTooLargeException {
  constructor(what: 'drawing' | 'attachment', maxBytes: number) {
    super({
      code: 'file_too_large',
      message: `This ${what} is larger than the ${maxBytes / MIB} MB a ${what} may be.`,
    });
  }
}

/** MariaDB refused a row for a unique index: someone else got there first. */
export function isDuplicateKey(error: unknown): boolean {
  return error instanceof QueryFailedError && (error.driverError as { code?: string }).code === 'ER_DUP_ENTRY';
}
