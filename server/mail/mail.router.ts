import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import { sentMailListQuerySchema, updateMailPreferencesSchema, type SentMailListQuery } from '../../shared/schemas/mail';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { validate } from '../core/validate';
import { sendWeeklyDigest } from './digest.service';
import { getMailPreferences, getSentMail, listSentMail, updateMailPreferences } from './mail.service';

export const mailRouter = Router();
const admin = requireRole('admin');

mailRouter.get('/preferences', requireUser, async (req, res) => {
  res.json(await getMailPreferences(currentUser(req).id));
});

mailRouter.put('/preferences', requireUser, validate({ body: updateMailPreferencesSchema }), async (req, res) => {
  res.json(await updateMailPreferences(currentUser(req), req.body));
});

mailRouter.get('/sent', admin, validate({ query: sentMailListQuerySchema }), async (req, res) => {
  res.json(await listSentMail(req.query as unknown as SentMailListQuery));
});

mailRouter.get('/sent/:id', admin, validate({ params: idParamsSchema }), async (req, res) => {
  res.json(await getSentMail(Number(req.params.id)));
});

mailRouter.post('/digest', admin, async (_req, res) => {
  res.json(await sendWeeklyDigest({ trigger: 'manual' }));
});
