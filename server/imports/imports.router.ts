import express, { Router } from 'express';
import multer from 'multer';
import { historyMaxBytes, type ImportRejection } from '../../shared/schemas/imports';
import { currentUser, requireRole } from '../core/auth-guards';
import { badRequest } from '../core/errors';
import { receiveUpload } from '../core/uploads';
import { importHistory } from './imports.service';

export const importsRouter = Router();

// Raw bytes rather than decoded text: line numbers are counted on the bytes and bad UTF-8 is named, not replaced.
const csvBody = express.raw({ type: ['text/csv', 'text/plain'], limit: historyMaxBytes });
const upload = receiveUpload(
  multer({ storage: multer.memoryStorage(), limits: { fileSize: historyMaxBytes, files: 1 } }).single('file'),
  'file',
);

importsRouter.post('/history', requireRole('supervisor', 'admin'), csvBody, upload, async (req, res) => {
  const file = req.file?.buffer ?? (Buffer.isBuffer(req.body) ? req.body : undefined);
  if (!file) {
    throw badRequest('file: send the history as a text/csv body or as the multipart field "file"', [
      { path: 'file', message: 'is required: a CSV file (text/csv body or multipart field "file")' },
    ]);
  }
  const outcome = await importHistory(currentUser(req), file);
  if (outcome.ok) {
    res.json(outcome.result);
    return;
  }
  const n = outcome.errors.length;
  res.status(422).json({
    errors: outcome.errors,
    error: {
      code: 'import-rejected',
      message: `The file has ${n} problem${n === 1 ? '' : 's'}; nothing was imported.`,
    },
  } satisfies ImportRejection & { error: { code: string; message: string } });
});
