import type { ApiIssue } from '../shared/schemas/api';

/** An error with an HTTP status and a stable code; the error handler renders it. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues?: ApiIssue[],
  ) {
    super(message);
  }
}

export const notFound = (what: string) => new HttpError(404, 'not_found', `${what} was not found`);
export const conflict = (message: string) => new HttpError(409, 'conflict', message);
export const forbidden = (message = 'Your role may not do this') => new HttpError(403, 'forbidden', message);
export const unauthenticated = (message = 'Sign in first') => new HttpError(401, 'unauthenticated', message);
