import { z } from 'zod';

/** DESIGN.md §5: writes from the shelf carry a client-made key so a retry never writes twice. */
export const idempotencyHeader = 'Idempotency-Key';
/** Answers replayed from a stored first result carry this header, so a client can tell. */
export const idempotentReplayHeader = 'Idempotent-Replayed';

export const idempotencyKeySchema = z
  .string()
  .trim()
  .min(8, 'use a key of at least 8 characters')
  .max(100, 'use a key of at most 100 characters')
  .regex(/^[A-Za-z0-9_.:-]+$/, 'use letters, digits and - _ . : only');

export const idempotencyScopes = ['incident', 'photos', 'shelf-mark', 'incident-photos'] as const;
export type IdempotencyScope = (typeof idempotencyScopes)[number];
