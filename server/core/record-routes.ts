import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';
import { idParamsSchema } from '../../shared/schemas/common';
import { currentUser, requireRole, requireUser, type SessionUser } from './auth-guards';
import { sendCsv } from './csv';
import { validate, validated } from './validate';

/** Who may write to the production record; a trainer only reads it. */
export const requireWriter = requireRole('technician', 'supervisor', 'admin');

export const validId = validate({ params: idParamsSchema });

/** The :id of a route behind validId (or any params schema with an id). */
export const idParam = (req: Request) => Number(req.params.id);

/** GET of a list: signed-in users, the query parsed by its schema, the service's answer as JSON. */
export function listRoute<Q>(
  schema: z.ZodType<Q>,
  list: (q: Q) => Promise<unknown>,
  guard: RequestHandler = requireUser,
): RequestHandler[] {
  return [
    guard,
    validate({ query: schema }),
    async (req, res) => {
      res.json(await list(validated(req, schema)));
    },
  ];
}

export interface CsvExport<Q, R> {
  rows: (q: Q) => Promise<R[]>;
  filename: string | (() => string);
  header: string[];
  row: (r: R) => unknown[];
}

/** GET of a list's CSV: the same filters as the list, every matching row, as a download. */
export function csvExportRoute<Q, R>(schema: z.ZodType<Q>, csv: CsvExport<Q, R>): RequestHandler[] {
  return [
    requireUser,
    validate({ query: schema }),
    async (req, res) => {
      const rows = await csv.rows(validated(req, schema));
      const filename = typeof csv.filename === 'string' ? csv.filename : csv.filename();
      sendCsv(res, filename, csv.header, rows.map(csv.row));
    },
  ];
}

/** GET of one record by its :id. */
export function detailRoute(
  get: (id: number) => Promise<unknown>,
  guard: RequestHandler = requireUser,
): RequestHandler[] {
  return [
    guard,
    validId,
    async (req, res) => {
      res.json(await get(idParam(req)));
    },
  ];
}

/** POST of a new record by a writer: 201 with what the service made. */
export function createRoute<B>(
  schema: z.ZodType<B>,
  create: (actor: SessionUser, body: B) => Promise<unknown>,
  guard: RequestHandler = requireWriter,
): RequestHandler[] {
  return [
    guard,
    validate({ body: schema }),
    async (req, res) => {
      res.status(201).json(await create(currentUser(req), validated(req, schema)));
    },
  ];
}

/** A write on the record named by :id (PATCH or an action POST), answered with the service's result. */
export function writeRoute<B>(
  schema: z.ZodType<B>,
  write: (actor: SessionUser, id: number, body: B) => Promise<unknown>,
  options: { guard?: RequestHandler; status?: number } = {},
): RequestHandler[] {
  return [
    options.guard ?? requireWriter,
    validate({ params: idParamsSchema, body: schema }),
    async (req, res) => {
      res.status(options.status ?? 200).json(await write(currentUser(req), idParam(req), validated(req, schema)));
    },
  ];
}
