import { randomUUID } from 'node:crypto';
import type { ErrorRequestHandler } from 'express';
import multer from 'multer';
import { QueryFailedError } from 'typeorm';
import { ZodError } from 'zod';
import type { ErrorBody } from '../../shared/schemas/common';
import { AppError } from './errors';
import { logger } from './logger';

function send(
  res: Parameters<ErrorRequestHandler>[2],
  status: number,
  error: ErrorBody['error'],
  details?: Record<string, unknown>,
) {
  res.status(status).json({ ...details, error } satisfies ErrorBody);
}

function isDuplicateKey(
  err: unknown,
): err is QueryFailedError & { driverError: { code: string; sqlMessage?: string } } {
  return err instanceof QueryFailedError && (err.driverError as { code?: string }).code === 'ER_DUP_ENTRY';
}

// The driver's codes for "MariaDB is not there right now": a 503 the client may retry, not a bug.
const unavailableCodes = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'PROTOCOL_CONNECTION_LOST',
  'ER_SERVER_SHUTDOWN',
  'ER_CON_COUNT_ERROR',
]);

function isDatabaseUnavailable(err: unknown): boolean {
  const direct = (err as { code?: unknown }).code;
  const driver = err instanceof QueryFailedError ? (err.driverError as { code?: unknown }).code : undefined;
  return [direct, driver].some((c) => typeof c === 'string' && unavailableCodes.has(c));
}

export const errorHandler: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  if (res.headersSent) return;
  if (err instanceof AppError)
    return send(res, err.status, { code: err.code, message: err.message, issues: err.issues }, err.details);
  if (err instanceof ZodError) {
    const issues = err.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
    const first = issues[0];
    const message = first ? `${first.path || 'input'}: ${first.message}` : 'Invalid input.';
    return send(res, 400, { code: 'invalid-input', message, issues });
  }
  if (isDuplicateKey(err)) {
    return send(res, 409, { code: 'conflict', message: 'A record with that value already exists.' });
  }
  if (err instanceof multer.MulterError) {
    const status = err.code === 'LIMIT_FILE_SIZE' || err.code === 'LIMIT_FILE_COUNT' ? 413 : 400;
    return send(res, status, {
      code: 'upload-rejected',
      message: err.message,
      issues: [{ path: err.field ?? 'file', message: err.message }],
    });
  }
  const status =
    (err as { status?: number; statusCode?: number }).status ?? (err as { statusCode?: number }).statusCode;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    // body-parser and friends: malformed JSON, body too large
    const { type, code } = err as { type?: string; code?: unknown };
    const message = type === 'entity.too.large' ? 'The request body is too large.' : (err as Error).message;
    const errorCode =
      typeof code === 'string' ? code : type === 'entity.parse.failed' ? 'malformed-body' : 'bad-request';
    return send(res, status, { code: errorCode, message });
  }
  if (isDatabaseUnavailable(err)) {
    logger.warn({ err, method: req.method, url: req.originalUrl }, 'database unavailable');
    return send(res, 503, {
      code: 'database-unavailable',
      message: 'The database is not answering; try again shortly.',
    });
  }
  const requestId = randomUUID();
  logger.error({ err, requestId, method: req.method, url: req.originalUrl }, 'unhandled error');
  send(res, 500, { code: 'internal', message: 'Something went wrong on the server.', requestId });
};
