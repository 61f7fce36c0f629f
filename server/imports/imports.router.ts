import express, { Router } from 'express';
import { historyMaxBytes } from '../../shared/schemas/imports';
import { currentUser, requireRole } from '../core/auth-guards';
import { receiveUpload, uploadedBytes } from '../core/uploads';
import { importHistoryUpload } from './imports.service';

export const importsRouter = Router();

// Raw bytes rather than decoded text: line numbers are counted on the bytes and bad UTF-8 is named, not replaced.
const csvBody = express.raw({ type: ['text/csv', 'text/plain'], limit: historyMaxBytes });
const upload = receiveUpload({ field: 'file', maxBytes: historyMaxBytes });

importsRouter.post('/history', requireRole('supervisor', 'admin'), csvBody, upload, async (req, res) => {
  res.json(await importHistoryUpload(currentUser(req), uploadedBytes(req)));
});
