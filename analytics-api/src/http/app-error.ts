/** The one error type services throw; the error handler turns it into `{ error: { code, message, details? } }`. */
export class AppError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status = 400,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export const notFound = (what: string) => new AppError('not-found', `${what} was not found`, 404);
export const forbidden = (message = 'Your role does not allow this') => new AppError('forbidden', message, 403);
