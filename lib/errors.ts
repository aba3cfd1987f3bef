/** A request that is well formed but clashes with what is stored (HTTP 409 or 422), naming the field at fault. */
export class ConflictError extends Error {
  constructor(
    public readonly field: string,
    message: string,
    public readonly status: 409 | 422 = 409,
  ) {
    super(message);
    this.name = 'ConflictError';
  }
}

/** An id that does not exist in the caller's organisation; other organisations' ids answer the same way. */
export class NotFoundError extends Error {
  constructor(message = 'Not found') {
    super(message);
    this.name = 'NotFoundError';
  }
}

/**
 * The service cannot take the request just now but will again soon (HTTP 503 with Retry-After): the solver's queue
 * is full, say. The message tells the user what to do.
 */
export class UnavailableError extends Error {
  constructor(
    message: string,
    public readonly retryAfterS: number,
  ) {
    super(message);
    this.name = 'UnavailableError';
  }
}
