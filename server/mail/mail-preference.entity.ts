import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';
import { mailKinds, type MailKind } from '../../shared/enums';

/** Absent row = the kind is on: everyone gets every mail meant for their role until they opt out. */
@Entity({ name: 'mail_preferences' })
export class MailPreference {
  @PrimaryColumn({ type: 'int', unsigned: true })
  userId: number;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'userId' })
  user?: Relation<User>;

  @PrimaryColumn({ type: 'enum', enum: mailKinds })
  kind: MailKind;

  @Column({ type: 'boolean' })
  enabled: boolean;

  @UpdateDateColumn({ type: 'datetime', precision: 6 })
  updatedAt: Date;
}
