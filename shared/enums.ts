import { z } from 'zod';

export const roles = ['technician', 'supervisor', 'trainer', 'admin'] as const;
export const roleSchema = z.enum(roles);
export type Role = (typeof roles)[number];

export const contaminants = [
  'bacterial',
  'trichoderma',
  'penicillium',
  'aspergillus',
  'pin-mould',
  'neurospora',
  'cobweb',
  'yeast',
  'unknown',
] as const;
export const contaminantSchema = z.enum(contaminants);
export type Contaminant = (typeof contaminants)[number];

export const contaminantNames: Record<Contaminant, string> = {
  bacterial: 'bacterial (wet spot)',
  trichoderma: 'green mould (Trichoderma)',
  penicillium: 'Penicillium',
  aspergillus: 'Aspergillus',
  'pin-mould': 'pin mould (Rhizopus / Mucor)',
  neurospora: 'Neurospora',
  cobweb: 'cobweb mould',
  yeast: 'yeast',
  unknown: 'unknown',
};

export const jarStatuses = ['incubating', 'colonised', 'contaminated', 'on-hold', 'discarded', 'released'] as const;
export const jarStatusSchema = z.enum(jarStatuses);
export type JarStatus = (typeof jarStatuses)[number];

export const cultureStates = ['quarantined', 'released', 'retired'] as const;
export const cultureStateSchema = z.enum(cultureStates);
export type CultureState = (typeof cultureStates)[number];

export const workspaces = ['still-air-box', 'flow-hood', 'open-bench'] as const;
export const workspaceSchema = z.enum(workspaces);
export type Workspace = (typeof workspaces)[number];

export const incidentStatuses = ['open', 'in-review', 'closed'] as const;
export const incidentStatusSchema = z.enum(incidentStatuses);
export type IncidentStatus = (typeof incidentStatuses)[number];

export const verdicts = ['pending', 'confirmed', 'ruled-out'] as const;
export const verdictSchema = z.enum(verdicts);
export type Verdict = (typeof verdicts)[number];

export const stagesFound = ['incubation', 'after-shaking', 'grow-room', 'customer'] as const;
export const stageFoundSchema = z.enum(stagesFound);
export type StageFound = (typeof stagesFound)[number];

/** The six Ms of the Ishikawa diagram (Ishikawa, Guide to Quality Control, 1968/1986). */
export const causeCategories = ['people', 'machine', 'method', 'material', 'measurement', 'environment'] as const;
export const causeCategorySchema = z.enum(causeCategories);
export type CauseCategory = (typeof causeCategories)[number];

/** Factor order is part of the causes sort contract (DESIGN.md §5). */
export const factors = [
  'grain',
  'cookRun',
  'cookMinutes',
  'session',
  'operator',
  'culture',
  'week',
  'transfers',
  'prepBatch',
  'workspace',
  'room',
] as const;
export const factorSchema = z.enum(factors);
export type Factor = (typeof factors)[number];

/**
 * What a factor is called where people read it, mid-sentence ("minutes at pressure <60", "ISO week 2026-W43"):
 * the server's hints and the screens' labels both read it from here.
 */
export const factorNames: Record<Factor, string> = {
  grain: 'grain',
  cookRun: 'cook run',
  cookMinutes: 'minutes at pressure',
  session: 'session',
  operator: 'operator',
  culture: 'culture',
  week: 'ISO week',
  transfers: 'grain-to-grain transfers',
  prepBatch: 'prep batch',
  workspace: 'workspace',
  room: 'incubation room',
};

/** The same name at the start of a label or heading ("Minutes at pressure"). */
export const factorLabel = (f: Factor) => factorNames[f].charAt(0).toUpperCase() + factorNames[f].slice(1);

export const incidentSeverities = ['low', 'medium', 'high'] as const;
export const incidentSeveritySchema = z.enum(incidentSeverities);
export type IncidentSeverity = (typeof incidentSeverities)[number];

export const agarResults = ['clean', 'contaminated', 'inconclusive'] as const;
export const agarResultSchema = z.enum(agarResults);
export type AgarResult = (typeof agarResults)[number];

export const jarEventTypes = ['check', 'shaken', 'moved', 'released', 'hold', 'discarded', 'status'] as const;
export type JarEventType = (typeof jarEventTypes)[number];

export const releasedTargets = ['grow-room', 'customer'] as const;
export const releasedToSchema = z.enum(releasedTargets);
export type ReleasedTo = (typeof releasedTargets)[number];

/**
 * Where a cook run's logged probe sat. Only a probe at the jar centre measures the F0 the grain got; a
 * chamber log overstates it (see shared/stats/cook-verdict.ts).
 */
export const logPlacements = ['chamber', 'centre'] as const;
export type LogPlacement = (typeof logPlacements)[number];

/** Where a cook run's F0 came from: its temperature log, or the upper-bound estimate from minutes at pressure. */
export const f0Sources = ['log', 'estimate'] as const;
export type F0Source = (typeof f0Sources)[number];

export const mailKinds = [
  'new-incident',
  'cluster-alert',
  'retraining',
  'weekly-digest',
  'action-assigned',
  'action-overdue',
] as const;
export const mailKindSchema = z.enum(mailKinds);
export type MailKind = (typeof mailKinds)[number];

export const mailStatuses = ['sent', 'failed'] as const;
export const mailStatusSchema = z.enum(mailStatuses);
export type MailStatus = (typeof mailStatuses)[number];

/** The factors whose levels a cluster of incidents can share, for the cluster alert (same words as `factors`). */
export const clusterFactors = ['cookRun', 'culture', 'session'] as const satisfies readonly Factor[];
export type ClusterFactor = (typeof clusterFactors)[number];

/** What started a weekly digest: the schedule or an admin's request. */
export const digestTriggers = ['schedule', 'manual'] as const;
export type DigestTrigger = (typeof digestTriggers)[number];
