import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import {
  createUserSchema,
  resetPasswordSchema,
  updateUserSchema,
  userListQuerySchema,
} from '../../shared/schemas/users';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { idParam } from '../core/record-routes';
import { validate, validated } from '../core/validate';
import { resetPassword } from './password-reset.service';
import { createUser, listPeople, listUsers, updateUser } from './users.service';

export const usersRouter = Router();
const admin = requireRole('admin');

usersRouter.get('/', admin, validate({ query: userListQuerySchema }), async (req, res) => {
  res.json(await listUsers(validated(req, userListQuerySchema)));
});

// Every signed-in person may name a colleague (an action's owner); only names and roles are shown.
usersRouter.get('/people', requireUser, async (_req, res) => {
  res.json(await listPeople());
});

usersRouter.post('/', admin, validate({ body: createUserSchema }), async (req, res) => {
  res.status(201).json(await createUser(currentUser(req), validated(req, createUserSchema)));
});

usersRouter.patch('/:id', admin, validate({ params: idParamsSchema, body: updateUserSchema }), async (req, res) => {
  res.json(await updateUser(currentUser(req), idParam(req), validated(req, updateUserSchema)));
});

usersRouter.post(
  '/:id/password-reset',
  admin,
  validate({ params: idParamsSchema, body: resetPasswordSchema }),
  async (req, res) => {
    res.json(await resetPassword(currentUser(req), idParam(req), validated(req, resetPasswordSchema)));
  },
);
