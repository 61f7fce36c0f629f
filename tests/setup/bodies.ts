import { z } from 'zod';
import { errorBodySchema, type ErrorBody } from '../../shared/schemas/common';

/** An HTTP answer as supertest gives it, whose body it types as any. */
interface Answer {
  body: unknown;
}

/**
 * The answer's body, checked against the shared schema the client parses it with, so each read also checks the
 * contract. The body comes back as sent, not as the parsed copy: zod drops keys it does not know, and a test
 * comparing the whole body must still see every key the server sent.
 */
export function bodyOf<S extends z.ZodType>(res: Answer, schema: S): z.output<S> {
  schema.parse(res.body);
  return res.body as z.output<S>;
}

/** The error of a refused request, in the one error body every route answers with. */
export const errorOf = (res: Answer): ErrorBody['error'] => bodyOf(res, errorBodySchema).error;

/** The field named by an error's issue (the first unless told). */
export const issuePath = (res: Answer, at = 0) => errorOf(res).issues?.[at]?.path;

/** A list answered as `{ items }` without paging. */
export const itemsOf = <T extends z.ZodType>(item: T) => z.object({ items: z.array(item) });
