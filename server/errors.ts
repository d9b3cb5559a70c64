/** The one error type of the server: a stable code, an HTTP status and a message the client shows. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) =>
  new AppError(400, 'invalid', message, fields);
export const unauthorized = (message = 'Sign in to continue.') =>
  new AppError(401, 'unauthenticated', message);
export const forbidden = (message = 'Your role may not do that.') =>
  new AppError(403, 'forbidden', message);
export const notFound = (what = 'That record') =>
  new AppError(404, 'not_found', `${what} was not found.`);
export const conflict = (message: string, fields?: Record<string, string>) =>
  new AppError(409, 'conflict', message, fields);
