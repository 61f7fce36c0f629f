import { setTimeout as sleep } from 'node:timers/promises';
import { QueryFailedError, type EntityManager } from 'typeorm';
import type { IdempotencyScope } from '../../shared/schemas/idempotency';
import { AppError } from '../core/errors';
import { idempotencyRepository } from './idempotency.repository';

export interface IdempotencyClaim {
  userId: number;
  key: string;
  scope: IdempotencyScope;
}

export interface StoredAnswer {
  status: number;
  body: unknown;
}

const uniqueIndex = 'UQ_idempotent_requests_user_key';

/**
 * Call first inside the write's transaction. A concurrent repeat blocks on the unique index until
 * the first commits, then fails with a duplicate key (see isKeyClash) and writes nothing.
 */
export async function claimKey(m: EntityManager, claim: IdempotencyClaim | undefined, recordId: number | null = null) {
  if (claim) await idempotencyRepository.insert(m, { ...claim, recordId });
}

/** For writes whose record id is known only after the insert. */
export async function attachRecord(m: EntityManager, claim: IdempotencyClaim | undefined, recordId: number) {
  if (claim) await idempotencyRepository.setRecord(m, claim.userId, claim.key, recordId);
}

export function isKeyClash(err: unknown): boolean {
  if (!(err instanceof QueryFailedError)) return false;
  const driver = err.driverError as { code?: string; sqlMessage?: string };
  return driver.code === 'ER_DUP_ENTRY' && (driver.sqlMessage ?? '').includes(uniqueIndex);
}

const reused = (claim: IdempotencyClaim, scope: string) =>
  new AppError(
    422,
    'idempotency-key-reused',
    `Idempotency-Key: this key was already used for another kind of write (${scope}); make a new key for ${claim.scope}.`,
    [{ path: 'Idempotency-Key', message: 'already used for another kind of write' }],
  );

/** The first result under this key, or null when the key is new. */
export async function storedAnswer(claim: IdempotencyClaim): Promise<StoredAnswer | 'pending' | null> {
  const row = await idempotencyRepository.find(claim.userId, claim.key);
  if (!row) return null;
  if (row.scope !== claim.scope) throw reused(claim, row.scope);
  if (row.status === null || row.body === null) return 'pending';
  return { status: row.status, body: JSON.parse(row.body) as unknown };
}

/**
 * A repeat that raced the first request waits for the first one's answer to be stored; the gap
 * between its commit and storing the answer is a few milliseconds.
 */
export async function awaitAnswer(claim: IdempotencyClaim, attempts = 100): Promise<StoredAnswer> {
  for (let i = 0; i < attempts; i++) {
    const answer = await storedAnswer(claim);
    if (answer && answer !== 'pending') return answer;
    await sleep(50);
  }
  throw new AppError(
    409,
    'request-in-progress',
    'Idempotency-Key: a request with this key is still being processed; send it again in a moment.',
    [{ path: 'Idempotency-Key', message: 'still being processed' }],
  );
}

export const saveAnswer = (claim: IdempotencyClaim, answer: StoredAnswer) =>
  idempotencyRepository.saveAnswer(claim.userId, claim.key, answer.status, JSON.stringify(answer.body));

/** The stored write under a key, locked for the caller's transaction (an undo), or null. */
export const lockClaimed = (m: EntityManager, userId: number, key: string) =>
  idempotencyRepository.findForUpdate(m, userId, key);

export const markUndone = (m: EntityManager, id: number) => idempotencyRepository.markUndone(m, id);
