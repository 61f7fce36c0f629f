import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Failed sign-ins, kept in MariaDB so that every app instance sees the same count. */
@Entity({ name: 'login_failures' })
@Index(['username', 'failedAt'])
@Index(['address', 'failedAt'])
export class LoginFailure {
  @PrimaryGeneratedColumn({ type: 'bigint', unsigned: true })
  id: string;

  @Column({ type: 'varchar', length: 64 })
  username: string;

  @Column({ type: 'varchar', length: 64 })
  address: string;

  @Column({ type: 'datetime', precision: 3 })
  failedAt: Date;
}
