import type { EntityManager } from 'typeorm';
import type { Page } from '../../shared/schemas/common';
import type {
  CreateStaffMemberInput,
  StaffListQuery,
  StaffMemberDto,
  UpdateStaffMemberInput,
} from '../../shared/schemas/staff';
import { diffEntries, recordAudit, type Actor } from '../audit/audit.service';
import { conflict, notFound, unprocessable } from '../core/errors';
import { pageResult } from '../core/paging';
import { dataSource } from '../db/data-source';
import type { StaffMember } from './staff-member.entity';
import { staffRepository } from './staff.repository';

const toDto = (s: StaffMember): StaffMemberDto => ({
  id: s.id,
  name: s.name,
  email: s.email,
  active: s.active,
  createdAt: s.createdAt.toISOString(),
});

const taken = (name: string) =>
  conflict(`${name} is already on the staff list.`, [{ path: 'name', message: 'is already on the staff list' }]);

export async function listStaff(q: StaffListQuery): Promise<Page<StaffMemberDto>> {
  const [rows, total] = await staffRepository.list(q);
  return pageResult(rows.map(toDto), total, q);
}

export async function createStaffMember(actor: Actor, input: CreateStaffMemberInput): Promise<StaffMemberDto> {
  return dataSource.transaction(async (m) => {
    if (await staffRepository.findByName(input.name, m)) throw taken(input.name);
    const member = await staffRepository.insert(m, { name: input.name, email: input.email || null, active: true });
    await recordAudit(m, actor, [
      { action: 'create', recordType: 'staff-member', recordId: member.id, newValue: { name: member.name } },
    ]);
    return toDto(member);
  });
}

export async function updateStaffMember(
  actor: Actor,
  id: number,
  input: UpdateStaffMemberInput,
): Promise<StaffMemberDto> {
  return dataSource.transaction(async (m) => {
    const member = await staffRepository.findById(id, m);
    if (!member) throw notFound('Staff member');
    if (input.name && input.name.toLowerCase() !== member.name.toLowerCase()) {
      if (await staffRepository.findByName(input.name, m)) throw taken(input.name);
    }
    const changes = { ...input, email: input.email === undefined ? undefined : input.email || null };
    const entries = diffEntries({ action: 'update', recordType: 'staff-member', recordId: id }, member, changes);
    Object.assign(member, Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined)));
    await staffRepository.save(m, member);
    await recordAudit(m, actor, entries);
    return toDto(member);
  });
}

/** An active staff person for a new record (training, a session); a deactivated one is refused by name. */
export async function requireActiveStaff(id: number, path = 'staffId', m?: EntityManager) {
  const member = await staffRepository.findById(id, m);
  if (!member) throw notFound('Staff member');
  if (!member.active) throw unprocessable(`${member.name} is deactivated.`, [{ path, message: 'is deactivated' }]);
  return member;
}

/**
 * The staff people behind typed names, made when new: the import meets operators this way. Names are
 * matched without regard to case, so "ana" in a file is the "Ana" already on the list.
 */
export async function staffForNames(m: EntityManager, names: string[]): Promise<StaffMember[]> {
  const wanted = [...new Set(names.map((n) => n.trim()).filter(Boolean))];
  await staffRepository.insertMissing(wanted, m);
  return staffRepository.findByNames(wanted, m);
}
