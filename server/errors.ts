// Typed errors that services throw; one middleware turns them into
// { error: { code, message, fields?, currentVersion? } }.
export type FieldErrors = Record<string, string>;

export class AppError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status: number,
    readonly fields?: FieldErrors,
    /** for stale_version: the version the record has now, so a client can say what changed */
    readonly currentVersion?: number,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const badRequest = (message: string, fields?: FieldErrors) =>
  new AppError('bad_request', message, 400, fields);
export const unauthorized = (message = 'Sign in to continue.') => new AppError('unauthorized', message, 401);
export const forbidden = (message = 'Your role does not allow this.') =>
  new AppError('forbidden', message, 403);
export const notFound = (what = 'That record') => new AppError('not_found', `${what} was not found.`, 404);
export const conflict = (message: string, code = 'conflict') => new AppError(code, message, 409);
/** 409 stale_version: the record was saved by someone else since the client read `version`. */
export const staleVersion = (message: string, currentVersion: number) =>
  new AppError('stale_version', message, 409, undefined, currentVersion);
