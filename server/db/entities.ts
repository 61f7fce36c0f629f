import { AuditEvent } from '../audit/audit-event.entity';
import { LoginFailure } from '../auth/login-failure.entity';
import { SessionRecord } from '../auth/session-record.entity';
import { CookRunReading } from '../cook-runs/cook-run-reading.entity';
import { CookRun } from '../cook-runs/cook-run.entity';
import { AgarTest } from '../cultures/agar-test.entity';
import { Culture } from '../cultures/culture.entity';
import { GrainLot } from '../grain/grain-lot.entity';
import { Grain } from '../grain/grain.entity';
import { PrepBatch } from '../grain/prep-batch.entity';
import { CorrectiveAction } from '../incidents/corrective-action.entity';
import { IdempotentRequest } from '../idempotency/idempotent-request.entity';
import { IncidentJar } from '../incidents/incident-jar.entity';
import { IncidentPhoto } from '../incidents/incident-photo.entity';
import { Incident } from '../incidents/incident.entity';
import { JarEvent } from '../jars/jar-event.entity';
import { Jar } from '../jars/jar.entity';
import { ClusterAlert } from '../mail/cluster-alert.entity';
import { DigestRun } from '../mail/digest-run.entity';
import { MailPreference } from '../mail/mail-preference.entity';
import { SentMail } from '../mail/sent-mail.entity';
import { Photo } from '../photos/photo.entity';
import { IncidentStepLink } from '../procedures/incident-step-link.entity';
import { ProcedureStep } from '../procedures/procedure-step.entity';
import { ProcedureVersion } from '../procedures/procedure-version.entity';
import { Procedure } from '../procedures/procedure.entity';
import { StaffMember } from '../staff/staff-member.entity';
import { InoculationSession } from '../sessions/inoculation-session.entity';
import { SessionStepCheck } from '../sessions/session-step-check.entity';
import { LabSettings } from '../settings/lab-settings.entity';
import {
  TallyColonisation,
  TallyCount,
  TallyDetection,
  TalliedColonisation,
  TalliedJar,
  TallyLevel,
  TallyState,
} from '../tallies/tally.entity';
import { RetrainRequest } from '../training/retrain-request.entity';
import { TrainingRecord } from '../training/training-record.entity';
import { User } from '../users/user.entity';

/** Listed as classes, not globs: Vitest and tsx both load them the same way. */
export const entities = [
  TallyColonisation,
  TallyCount,
  TallyDetection,
  TalliedColonisation,
  TallyLevel,
  TalliedJar,
  TallyState,
  User,
  StaffMember,
  SessionRecord,
  LoginFailure,
  AuditEvent,
  LabSettings,
  Grain,
  GrainLot,
  PrepBatch,
  CookRun,
  CookRunReading,
  Culture,
  AgarTest,
  InoculationSession,
  SessionStepCheck,
  Jar,
  JarEvent,
  Photo,
  Incident,
  IncidentJar,
  IncidentPhoto,
  CorrectiveAction,
  Procedure,
  ProcedureVersion,
  ProcedureStep,
  IncidentStepLink,
  TrainingRecord,
  RetrainRequest,
  SentMail,
  MailPreference,
  ClusterAlert,
  DigestRun,
  IdempotentRequest,
];
