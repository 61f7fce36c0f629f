import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { mailKinds, mailStatuses, type MailKind, type MailStatus } from '../../shared/schemas/mail';

/** One row per message handed to SMTP, whether it went or not: the admin's list of what was sent. */
@Entity({ name: 'sent_mails' })
@Index(['createdAt'])
@Index(['kind', 'createdAt'])
export class SentMail {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'enum', enum: mailKinds })
  kind: MailKind;

  @Column({ type: 'int', unsigned: true, nullable: true })
  toUserId: number | null;

  @Index()
  @Column({ type: 'varchar', length: 254 })
  toAddress: string;

  @Index()
  @Column({ type: 'varchar', length: 300 })
  subject: string;

  @Column({ type: 'mediumtext' })
  textBody: string;

  @Index()
  @Column({ type: 'enum', enum: mailStatuses })
  status: MailStatus;

  @Column({ type: 'varchar', length: 1000, nullable: true })
  error: string | null;

  @Column({ type: 'varchar', length: 250, nullable: true })
  messageId: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
