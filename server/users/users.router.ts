import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import {
  createUserSchema,
  updateUserSchema,
  userListQuerySchema,
  type UserListQuery,
} from '../../shared/schemas/users';
import { currentUser, requireRole } from '../core/auth-guards';
import { validate } from '../core/validate';
import { createUser, listUsers, updateUser } from './users.service';

export const usersRouter = Router();
const admin = requireRole('admin');

usersRouter.get('/', admin, validate({ query: userListQuerySchema }), async (req, res) => {
  res.json(await listUsers(req.query as unknown as UserListQuery));
});

usersRouter.post('/', admin, validate({ body: createUserSchema }), async (req, res) => {
  res.status(201).json(await createUser(currentUser(req), req.body));
});

usersRouter.patch('/:id', admin, validate({ params: idParamsSchema, body: updateUserSchema }), async (req, res) => {
  res.json(await updateUser(currentUser(req), Number(req.params.id), req.body));
});
