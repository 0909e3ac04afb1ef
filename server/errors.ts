/** Typed domain errors; the one error middleware maps them to status codes. */
export interface ErrorDetail {
  path: string;
  message: string;
}

export class DomainError extends Error {
  constructor(
    public readonly status: number,
    message: string,
    public readonly details?: ErrorDetail[],
  ) {
    super(message);
  }

  /** The answer's JSON body; a subclass adds the fields its routes' contracts declare (`otherResponses`). */
  body(): { error: string; details?: ErrorDetail[] } {
    return this.details ? { error: this.message, details: this.details } : { error: this.message };
  }
}
export class ValidationError extends DomainError {
  constructor(message: string, details?: ErrorDetail[]) {
    super(400, message, details);
  }
}
export class UnauthorizedError extends DomainError {
  constructor(message = 'Sign in to continue') {
    super(401, message);
  }
}
export class ForbiddenError extends DomainError {
  constructor(message = 'Your role does not allow this action') {
    super(403, message);
  }
}
export class NotFoundError extends DomainError {
  constructor(what: string) {
    super(404, `${what} not found`);
  }
}
export class ConflictError extends DomainError {
  constructor(message: string, details?: ErrorDetail[]) {
    super(409, message, details);
  }
}
