import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';

interface Schemas {
  body?: z.ZodType;
  query?: z.ZodType;
  params?: z.ZodType;
}

/** What validate() parsed for a request, by the schema that parsed it. */
const parsedBySchema = new WeakMap<Request, Map<z.ZodType, unknown>>();

/**
 * Parses each part and puts the parsed value back, so handlers read coerced, defaulted input.
 * Express 5 makes req.query a getter, hence defineProperty.
 */
export function validate(schemas: Schemas): RequestHandler {
  return (req, _res, next) => {
    const parsed = parsedBySchema.get(req) ?? new Map<z.ZodType, unknown>();
    parsedBySchema.set(req, parsed);
    if (schemas.params) {
      req.params = schemas.params.parse(req.params) as typeof req.params;
      parsed.set(schemas.params, req.params);
    }
    if (schemas.query) {
      const query: unknown = schemas.query.parse(req.query);
      Object.defineProperty(req, 'query', { value: query, writable: true, configurable: true });
      parsed.set(schemas.query, query);
    }
    if (schemas.body) {
      req.body = schemas.body.parse(req.body ?? {});
      parsed.set(schemas.body, req.body);
    }
    next();
  };
}

/**
 * The value `schema` parsed for this request, typed by that schema. Throws (a 500: a wiring mistake, not
 * bad input) when the route has no validate() with this very schema, so an unparsed value never passes as parsed.
 */
export function validated<S extends z.ZodType>(req: Request, schema: S): z.output<S> {
  const parsed = parsedBySchema.get(req);
  if (!parsed?.has(schema))
    throw new Error(`validated(): ${req.method} ${req.path} has no validate() with this schema`);
  return parsed.get(schema) as z.output<S>;
}
