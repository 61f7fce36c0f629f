import { Router } from 'express';
import { sentMailListQuerySchema, updateMailPreferencesSchema } from '../../shared/schemas/mail';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { detailRoute, listRoute } from '../core/record-routes';
import { validate, validated } from '../core/validate';
import { sendWeeklyDigest } from './digest.service';
import { getMailPreferences, getSentMail, listSentMail, updateMailPreferences } from './mail.service';

export const mailRouter = Router();
const admin = requireRole('admin');

mailRouter.get('/preferences', requireUser, async (req, res) => {
  res.json(await getMailPreferences(currentUser(req).id));
});

mailRouter.put('/preferences', requireUser, validate({ body: updateMailPreferencesSchema }), async (req, res) => {
  res.json(await updateMailPreferences(currentUser(req), validated(req, updateMailPreferencesSchema)));
});

mailRouter.get('/sent', ...listRoute(sentMailListQuerySchema, listSentMail, admin));
mailRouter.get('/sent/:id', ...detailRoute(getSentMail, admin));

mailRouter.post('/digest', admin, async (_req, res) => {
  res.json(await sendWeeklyDigest({ trigger: 'manual' }));
});
