import { AuditEvent } from '../audit/audit-event.entity';
import { LoginFailure } from '../auth/login-failure.entity';
import { SessionRecord } from '../auth/session-record.entity';
import { User } from '../users/user.entity';

/** Listed as classes, not globs: Vitest and tsx both load them the same way. */
export const entities = [User, SessionRecord, LoginFailure, AuditEvent];
