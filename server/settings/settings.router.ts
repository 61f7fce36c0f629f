import { Router } from 'express';
import { updateLabSettingsSchema } from '../../shared/schemas/settings';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { validate, validated } from '../core/validate';
import { readLabSettings, updateLabSettings } from './settings.service';

export const settingsRouter = Router();

// Every role reads the thresholds its screens are judged against; only an admin changes them.
settingsRouter.get('/', requireUser, async (_req, res) => {
  res.json(await readLabSettings());
});

settingsRouter.patch('/', requireRole('admin'), validate({ body: updateLabSettingsSchema }), async (req, res) => {
  res.json(await updateLabSettings(currentUser(req), validated(req, updateLabSettingsSchema)));
});
