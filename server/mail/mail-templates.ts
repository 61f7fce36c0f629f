import { contaminantNames, type Contaminant, type ClusterFactor } from '../../shared/enums';
import { mailCautions } from './mail-cautions';
import { percent, renderMail, type MailBlock } from './mail-layout';
import type { MailContent } from './mailer';

export interface IncidentJarFacts {
  label: string;
  cookRun: string | null;
  session: string | null;
  culture: string | null;
}

export interface NewIncidentFacts {
  id: number;
  foundOn: string;
  foundByName: string;
  stage: string;
  contaminant: Contaminant;
  severity: string;
  sealed: boolean;
  sterilisedBeforeDisposal: boolean;
  jars: IncidentJarFacts[];
  url: string;
}

const jarCount = (n: number) => `${n} ${n === 1 ? 'jar' : 'jars'}`;
const jarLine = (j: IncidentJarFacts) =>
  `${j.label} — cook run ${j.cookRun ?? '–'}, session ${j.session ?? '–'}, culture ${j.culture ?? '–'}`;

export function newIncidentMail(f: NewIncidentFacts): MailContent {
  const name = contaminantNames[f.contaminant];
  const blocks: MailBlock[] = [
    {
      kind: 'p',
      text: `${f.foundByName} filed incident #${f.id} on ${f.foundOn}: ${name}, ${jarCount(f.jars.length)}, found at the ${f.stage} stage, severity ${f.severity}.`,
    },
    { kind: 'list', items: f.jars.map(jarLine) },
    {
      kind: 'p',
      text: `Containment: ${f.sealed ? 'sealed' : 'not yet sealed'}; ${f.sterilisedBeforeDisposal ? 'sterilised before disposal' : 'not yet sterilised'}.`,
    },
    { kind: 'link', label: 'Review the incident', url: f.url },
    mailCautions.spores,
    mailCautions.disposal,
    mailCautions.deferral,
  ];
  return renderMail(`New incident #${f.id}: ${name}, ${jarCount(f.jars.length)}`, blocks);
}

export const dimensionLabels: Record<ClusterFactor, string> = {
  cookRun: 'cook run',
  culture: 'culture',
  session: 'inoculation session',
};

/** TRADE.md §2 attribution rules of thumb [common practice], worded as leads. */
const clusterLeads: Record<ClusterFactor, string> = {
  cookRun:
    'Early contamination across one cook run points first at the sterilisation cycle: time at pressure, venting, the gauge, overloading and grain moisture.',
  culture: 'Contamination confined to one culture points at the culture itself: test it on agar before using it again.',
  session:
    'Contamination spread over one session’s jars points at technique or the workspace: wipe-downs, gloves, needle flaming, the injection port.',
};

export interface ClusterFacts {
  dimension: ClusterFactor;
  code: string;
  incidents: { id: number; foundOn: string; contaminant: Contaminant; jars: number }[];
  threshold: number;
  days: number;
  firstFoundOn: string;
  lastFoundOn: string;
  url: string;
}

export function clusterAlertMail(f: ClusterFacts): MailContent {
  const what = `${dimensionLabels[f.dimension]} ${f.code}`;
  const jars = f.incidents.reduce((s, i) => s + i.jars, 0);
  const blocks: MailBlock[] = [
    {
      kind: 'p',
      text: `${f.incidents.length} incidents from ${what} were found between ${f.firstFoundOn} and ${f.lastFoundOn}, ${jarCount(jars)} in all. The lab alerts at ${f.threshold} incidents within ${f.days} days.`,
    },
    {
      kind: 'table',
      head: ['Incident', 'Found on', 'Contaminant', 'Jars'],
      rows: f.incidents.map((i) => [`#${i.id}`, i.foundOn, contaminantNames[i.contaminant], String(i.jars)]),
    },
    {
      kind: 'p',
      text: `Lead: ${clusterLeads[f.dimension]} Jars from one ${dimensionLabels[f.dimension]} are not independent, so treat this as a lead, not a verdict.`,
    },
    { kind: 'link', label: `Open the incidents of ${what}`, url: f.url },
    mailCautions.spores,
    mailCautions.disposal,
    mailCautions.deferral,
  ];
  return renderMail(`Cluster alert: ${f.incidents.length} incidents from ${what} within ${f.days} days`, blocks);
}

export interface RetrainingFacts {
  personName: string;
  requestedByName: string;
  reason: string;
  procedureTitle: string;
  version: number;
  steps: { position: number; text: string; caution: string | null }[];
  url: string;
}

export function retrainingMail(f: RetrainingFacts): MailContent {
  const blocks: MailBlock[] = [
    {
      kind: 'p',
      text: `${f.personName}, ${f.requestedByName} asks you to retrain on “${f.procedureTitle}”, version ${f.version}.`,
    },
    { kind: 'p', text: `Reason: ${f.reason}` },
    { kind: 'p', text: `The ${f.steps.length} steps of version ${f.version}:` },
    {
      kind: 'list',
      items: f.steps.map((s) => `${s.position}. ${s.text}${s.caution ? ` (Caution: ${s.caution})` : ''}`),
    },
    { kind: 'link', label: 'Read the procedure', url: f.url },
    mailCautions.flame,
    mailCautions.deferral,
  ];
  return renderMail(`Retraining requested: ${f.procedureTitle} (version ${f.version})`, blocks);
}

export interface DigestWeek {
  week: string;
  jars: number;
  contaminated: number;
  incubating: number;
  rate: number | null;
  provisional: boolean;
  outOfControl: boolean;
}

export interface DigestFacts {
  reportWeek: string;
  weeks: DigestWeek[];
  pBar: number | null;
  grains: { grain: string; jars: number; contaminated: number; rate: number | null }[];
  url: string;
}

const flag = (w: DigestWeek) => (w.outOfControl ? 'OUT OF CONTROL' : w.provisional ? 'provisional' : '');

export function weeklyDigestMail(f: DigestFacts): MailContent {
  const last = f.weeks[f.weeks.length - 1];
  const blocks: MailBlock[] = [
    {
      kind: 'p',
      text: last
        ? `Week ${last.week}: ${last.jars} jars inoculated, ${last.contaminated} contaminated (${percent(last.rate)}), ${last.incubating} still incubating.`
        : 'No weeks to report.',
    },
    {
      kind: 'table',
      head: ['Week', 'Jars', 'Contaminated', 'Incubating', 'Rate', ''],
      rows: f.weeks.map((w) => [
        w.week,
        String(w.jars),
        String(w.contaminated),
        String(w.incubating),
        percent(w.rate),
        flag(w),
      ]),
    },
    {
      kind: 'p',
      text: `Centre line p̄ over settled weeks: ${percent(f.pBar)}. A week with jars still incubating is provisional and never flagged.`,
    },
  ];
  if (f.grains.length) {
    blocks.push({
      kind: 'table',
      head: [`Grain, ${f.reportWeek}`, 'Jars', 'Contaminated', 'Rate'],
      rows: f.grains.map((g) => [g.grain, String(g.jars), String(g.contaminated), percent(g.rate)]),
    });
  }
  blocks.push({ kind: 'link', label: 'Open the weekly table', url: f.url }, mailCautions.deferral);
  return renderMail(`Weekly contamination digest: ${f.reportWeek}`, blocks);
}
