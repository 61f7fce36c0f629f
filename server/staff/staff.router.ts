import { Router } from 'express';
import { createStaffMemberSchema, staffListQuerySchema, updateStaffMemberSchema } from '../../shared/schemas/staff';
import { requireRole } from '../core/auth-guards';
import { createRoute, listRoute, writeRoute } from '../core/record-routes';
import { createStaffMember, listStaff, updateStaffMember } from './staff.service';

/** Mounted at /api/staff. Every signed-in person reads the list (an operator or owner picker). */
export const staffRouter = Router();
const keepers = requireRole('supervisor', 'trainer', 'admin');

staffRouter.get('/', ...listRoute(staffListQuerySchema, listStaff));
staffRouter.post('/', ...createRoute(createStaffMemberSchema, createStaffMember, keepers));
staffRouter.patch('/:id', ...writeRoute(updateStaffMemberSchema, updateStaffMember, { guard: keepers }));
