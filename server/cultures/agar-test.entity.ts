import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'agar_tests' })
export class AgarTest {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index()
  @Column({ type: 'int', unsigned: true })
  cultureId: number;

  @Column({ type: 'date' })
  testedOn: string;

  @Column({ type: 'enum', enum: ['clean', 'contaminated', 'inconclusive'] })
  result: 'clean' | 'contaminated' | 'inconclusive';

  @Column({ type: 'int', unsigned: true, nullable: true })
  photoId: number | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  recordedById: number | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
