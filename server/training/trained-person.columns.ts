import { Column, JoinColumn, ManyToOne, type Relation } from 'typeorm';
import { ProcedureVersion } from '../procedures/procedure-version.entity';
import { StaffMember } from '../staff/staff-member.entity';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';

/**
 * The columns a training record and a retraining request share: the person (an account, or a staff
 * person without one) and the procedure version the training is on.
 */
export abstract class TrainedPersonColumns {
  @Column({ type: 'int', unsigned: true, nullable: true })
  userId: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'userId' })
  user?: Relation<User>;

  /** A staff person without an account; set instead of the user id. */
  @Column({ type: 'int', unsigned: true, nullable: true })
  staffId: number | null;

  @ManyToOne(() => StaffMember, restrict)
  @JoinColumn({ name: 'staffId' })
  staff?: Relation<StaffMember>;

  @Column({ type: 'int', unsigned: true })
  procedureVersionId: number;

  @ManyToOne(() => ProcedureVersion, restrict)
  @JoinColumn({ name: 'procedureVersionId' })
  procedureVersion?: Relation<ProcedureVersion>;
}
