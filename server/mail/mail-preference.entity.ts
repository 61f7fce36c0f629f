import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { mailKinds, type MailKind } from '../../shared/schemas/mail';

/** Absent row = the kind is on: everyone gets every mail meant for their role until they opt out. */
@Entity({ name: 'mail_preferences' })
export class MailPreference {
  @PrimaryColumn({ type: 'int', unsigned: true })
  userId: number;

  @PrimaryColumn({ type: 'enum', enum: mailKinds })
  kind: MailKind;

  @Column({ type: 'boolean' })
  enabled: boolean;

  @UpdateDateColumn({ type: 'datetime', precision: 6 })
  updatedAt: Date;
}
