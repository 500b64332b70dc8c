/** How the API answers a domain error; the one exception filter maps each kind to an HTTP status. */
export type DomainErrorKind = 'invalid' | 'unauthenticated' | 'forbidden' | 'not_found' | 'conflict';

/**
 * A failure the domain knows about, with a stable machine-readable code that the web app can act
 * on. Services throw these; only `ApiExceptionFilter` knows about HTTP.
 */
export class DomainError extends Error {
  constructor(
    readonly kind: DomainErrorKind,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class NotFoundError extends DomainError {
  constructor(code: string, message: string) {
    super('not_found', code, message);
  }
}

export class ForbiddenError extends DomainError {
  constructor(code: string, message: string) {
    super('forbidden', code, message);
  }
}

export class ConflictError extends DomainError {
  constructor(code: string, message: string) {
    super('conflict', code, message);
  }
}

export class UnauthenticatedError extends DomainError {
  constructor(code: string, message: string) {
    super('unauthenticated', code, message);
  }
}
