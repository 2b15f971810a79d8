import type { ErrorRequestHandler, RequestHandler } from 'express';
import { MulterError } from 'multer';
import { UniqueConstraintError } from 'sequelize';
import * as z from 'zod/mini';
import { AppError } from './app-error';

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError('NOT_FOUND', `No API route for ${req.method} ${req.path}.`, 404));
};

/** Maps every error to one body shape; anything unexpected is logged and answered with a generic 500. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const error = toAppError(err);
  if (error.status >= 500) req.log?.error({ err }, 'unhandled error');
  if (res.headersSent) return;
  res.status(error.status).json({
    error: { code: error.code, message: error.message, ...(error.fields ? { fields: error.fields } : {}) },
  });
};

function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof z.core.$ZodError) {
    const { fieldErrors, formErrors } = z.flattenError(err);
    const fields = fieldErrors as Record<string, string[]>;
    if (formErrors.length) fields._ = formErrors;
    return AppError.badRequest('Some fields need attention.', fields);
  }
  if (err instanceof MulterError) {
    const tooLarge = err.code === 'LIMIT_FILE_SIZE';
    return new AppError(tooLarge ? 'FILE_TOO_LARGE' : 'BAD_UPLOAD', err.message, tooLarge ? 413 : 400);
  }
  if (err instanceof UniqueConstraintError) return AppError.conflict('That already exists.');
  const status =
    (err as { status?: number; statusCode?: number }).status ?? (err as { statusCode?: number }).statusCode;
  if (status === 400 && (err as { type?: string }).type === 'entity.parse.failed') {
    return AppError.badRequest('The request body is not valid JSON.');
  }
  if (status === 413) return new AppError('TOO_LARGE', 'The request is too large.', 413);
  if (status === 404) return AppError.notFound('That file');
  // Other client errors raised by Express itself (http-errors) keep their status; their messages are safe when exposed.
  if (status && status >= 400 && status < 500) {
    const exposed = (err as { expose?: boolean }).expose ? (err as Error).message : 'The request could not be handled.';
    return new AppError('BAD_REQUEST', exposed, status);
  }
  return new AppError('INTERNAL', 'Something went wrong on our side. Please try again.', 500);
}
