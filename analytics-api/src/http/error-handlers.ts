import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError } from './app-error';

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new AppError('not-found', `No route for ${req.method} ${req.path}`, 404));
};

/** Registered last: every failure leaves the API in the one error shape. */
export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  if (err instanceof AppError) {
    res.status(err.status).json({ error: { code: err.code, message: err.message, details: err.details } });
    return;
  }
  // body-parser, multer and similar report client errors with a status and a type.
  const status = typeof err?.status === 'number' ? err.status : typeof err?.statusCode === 'number' ? err.statusCode : 500;
  if (status === 403 && err?.code === 'EBADCSRFTOKEN') {
    res.status(403).json({ error: { code: 'csrf', message: 'The page is out of date; reload and try again' } });
    return;
  }
  if (status < 500) {
    const code = err?.type === 'entity.too.large' || err?.code === 'LIMIT_FILE_SIZE' ? 'too-large' : 'bad-request';
    res.status(status).json({ error: { code, message: String(err?.message ?? 'Bad request') } });
    return;
  }
  console.error(err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side; nothing was saved' } });
};
