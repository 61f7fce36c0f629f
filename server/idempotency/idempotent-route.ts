import type { RequestHandler, Response } from 'express';
import {
  idempotencyHeader,
  idempotencyKeySchema,
  idempotentReplayHeader,
  type IdempotencyScope,
} from '../../shared/schemas/idempotency';
import { currentUser } from '../core/auth-guards';
import { badRequest } from '../core/errors';
import {
  awaitAnswer,
  isKeyClash,
  saveAnswer,
  storedAnswer,
  type IdempotencyClaim,
  type StoredAnswer,
} from './idempotency.service';

function claimOf(req: Parameters<RequestHandler>[0], scope: IdempotencyScope): IdempotencyClaim | undefined {
  const raw = req.get(idempotencyHeader);
  if (raw === undefined) return undefined;
  const parsed = idempotencyKeySchema.safeParse(raw);
  if (!parsed.success) {
    const message = parsed.error.issues[0]?.message ?? 'invalid key';
    throw badRequest(`${idempotencyHeader}: ${message}`, [{ path: idempotencyHeader, message }]);
  }
  return { userId: currentUser(req).id, key: parsed.data, scope };
}

const replay = (res: Response, answer: StoredAnswer) =>
  res.setHeader(idempotentReplayHeader, 'true').status(answer.status).json(answer.body);

/**
 * The handler of a write from the shelf (after guards and validation). With an Idempotency-Key, a
 * repeat answers the first result again; the write itself claims the key in its own transaction.
 */
export function idempotentHandler(
  scope: IdempotencyScope,
  status: number,
  write: (req: Parameters<RequestHandler>[0], claim: IdempotencyClaim | undefined) => Promise<unknown>,
): RequestHandler {
  return async (req, res) => {
    const claim = claimOf(req, scope);
    if (!claim) return void res.status(status).json(await write(req, undefined));
    const earlier = await storedAnswer(claim);
    if (earlier) return void replay(res, earlier === 'pending' ? await awaitAnswer(claim) : earlier);
    let body: unknown;
    try {
      body = await write(req, claim);
    } catch (err) {
      if (!isKeyClash(err)) throw err;
      return void replay(res, await awaitAnswer(claim));
    }
    await saveAnswer(claim, { status, body });
    res.status(status).json(body);
  };
}
