import type { FieldIssue } from '../../shared/schemas/common';

/** Operational errors: expected, shown to the user with their code; anything else is a 500. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues?: FieldIssue[],
    /** Sent beside the error body, for a refusal that carries more (a rejected file's errors by line). */
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const badRequest = (message: string, issues?: FieldIssue[]) =>
  new AppError(400, 'invalid-input', message, issues);
export const unauthenticated = () => new AppError(401, 'unauthenticated', 'Sign in first.');
export const forbidden = (message = 'Your role cannot do this.') => new AppError(403, 'forbidden', message);
export const notFound = (what: string) => new AppError(404, 'not-found', `${what} was not found.`);
export const conflict = (message: string, issues?: FieldIssue[]) => new AppError(409, 'conflict', message, issues);
export const unprocessable = (message: string, issues?: FieldIssue[]) =>
  new AppError(422, 'unprocessable', message, issues);
