import {
  contaminantNames,
  type CauseCategory,
  type IncidentStatus,
  type StageFound,
  type Verdict,
  type IncidentSeverity,
} from '../../../shared/enums';
import type { BadgeTone } from '../../components/ui/badge';

export const statusLabels: Record<IncidentStatus, string> = {
  open: 'Open',
  'in-review': 'In review',
  closed: 'Closed',
};
export const statusTones: Record<IncidentStatus, BadgeTone> = {
  open: 'warn',
  'in-review': 'accent',
  closed: 'neutral',
};

export const verdictLabels: Record<Verdict, string> = {
  pending: 'Pending',
  confirmed: 'Confirmed',
  'ruled-out': 'Ruled out',
};
export const verdictTones: Record<Verdict, BadgeTone> = { pending: 'neutral', confirmed: 'danger', 'ruled-out': 'ok' };

export const stageLabels: Record<StageFound, string> = {
  incubation: 'Incubation',
  'after-shaking': 'After shaking',
  'grow-room': 'Grow room',
  customer: 'At the customer',
};

export const severityLabels: Record<IncidentSeverity, string> = { low: 'Low', medium: 'Medium', high: 'High' };

/** Ishikawa's six Ms (Guide to Quality Control, 1968/1986), with a line each on what belongs there. */
export const causeLabels: Record<CauseCategory, { label: string; hint: string }> = {
  people: { label: 'People', hint: 'technique, training, hygiene' },
  machine: { label: 'Machine', hint: 'cooker, autoclave, flow hood, gauge' },
  method: { label: 'Method', hint: 'the procedure itself' },
  material: { label: 'Material', hint: 'grain, culture, jars, lids' },
  measurement: { label: 'Measurement', hint: 'gauge or thermometer readings, timing' },
  environment: { label: 'Environment', hint: 'incubation room, air, season' },
};

export const fieldLabels: Record<string, string> = {
  status: 'Status',
  verdict: 'Verdict',
  causeCategory: 'Cause category',
  rootCauseNotes: 'Root-cause notes',
  voided: 'Voided',
  photos: 'Photo',
  contaminant: 'Contaminant',
  signColour: 'Colour',
  signSmell: 'Smell',
  signTexture: 'Texture',
  severity: 'Severity',
  stage: 'Stage found',
  foundAt: 'Found at',
  sealed: 'Sealed',
  sterilisedBeforeDisposal: 'Sterilised before disposal',
  notes: 'Notes',
  what: 'Action',
  ownerName: 'Owner',
  ownerId: 'Owner',
  dueOn: 'Due',
  doneOn: 'Done',
  verification: 'Verification',
  factor: 'Factor',
  level: 'Level',
  jars: 'Jars',
  incidentId: 'Incident',
  owner: 'Owner',
};

const allLabels: Record<string, string> = {
  ...contaminantNames,
  ...statusLabels,
  ...verdictLabels,
  ...stageLabels,
  ...severityLabels,
  true: 'yes',
  false: 'no',
};

/** Audit values are stored as text; show enum codes by their names. */
export const valueLabel = (value: string | null) => (value === null ? '—' : (allLabels[value] ?? value));

/** The tile names on a phone: the display name before any parenthesis, as the import also accepts. */
export const contaminantShortNames = Object.fromEntries(
  Object.entries(contaminantNames).map(([code, name]) => {
    const short = name.split('(')[0]!.trim();
    return [code, short.charAt(0).toUpperCase() + short.slice(1)];
  }),
) as Record<keyof typeof contaminantNames, string>;
