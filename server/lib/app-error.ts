/** The one error class: services throw it, the error handler turns it into `{ error: { code, message, fields? } }`. */
export class AppError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status: number,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
  }

  static notFound(what = 'That') {
    return new AppError('NOT_FOUND', `${what} was not found.`, 404);
  }

  static forbidden(message = 'You are not allowed to do that.') {
    return new AppError('FORBIDDEN', message, 403);
  }

  static badRequest(message: string, fields?: Record<string, string[]>) {
    return new AppError('BAD_REQUEST', message, 400, fields);
  }

  static conflict(message: string) {
    return new AppError('CONFLICT', message, 409);
  }
}
