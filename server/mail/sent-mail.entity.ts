import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';
import { mailKinds, mailStatuses, type MailKind, type MailStatus } from '../../shared/enums';

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

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'toUserId' })
  toUser?: Relation<User>;

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
