import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { InoculationSession } from './inoculation-session.entity';
import { ProcedureStep } from '../procedures/procedure-step.entity';
import { restrict } from '../db/relations';

/** The checklist of a session: one row per step of the procedure version it followed. */
@Entity({ name: 'session_step_checks' })
export class SessionStepCheck {
  @PrimaryColumn({ type: 'int', unsigned: true })
  sessionId: number;

  @ManyToOne(() => InoculationSession, restrict)
  @JoinColumn({ name: 'sessionId' })
  session?: Relation<InoculationSession>;

  @PrimaryColumn({ type: 'int', unsigned: true })
  stepId: number;

  @ManyToOne(() => ProcedureStep, restrict)
  @JoinColumn({ name: 'stepId' })
  step?: Relation<ProcedureStep>;

  @Column({ type: 'boolean' })
  done: boolean;
}
