import type { EntityManager } from 'typeorm';
import { setCookRunDetails } from '../cook-runs/cook-runs.service';
import { culturesByCodes, setCultureDetails } from '../cultures/cultures.service';
import { labNoon } from '../imports/lab-noon';
import { jarsByLabels, setJarDetails, setParentJar } from '../jars/jar-details.service';
import { setSessionDetails } from '../sessions/sessions.service';
import { accountNames } from '../users/users.service';
import { addDays } from './demo-calendar';
import { demoCultures } from './demo-cultures';
import type { DemoPlan } from './demo-plan';

const HOUR = 3_600_000;
/** 15 psi gauge, the usual set-point (shared/TRADE.md §1); the invented lab sits at 85 m. */
const gaugeKPa = 103.4;
const altitudeM = 85;

const vessels: Record<string, string> = {
  '1 L jar': 'Pressure cooker 23 L',
  '2 L jar': 'Pressure cooker 23 L',
  '3 kg bag': 'Autoclave 60 L',
};

/**
 * What a history file cannot carry — vessels, containers, workspaces, strains, rooms, colonisation
 * dates and grain-to-grain parents — written onto the imported records, inside the loader's transaction.
 */
export async function addPlanDetails(m: EntityManager, plan: DemoPlan, timeZone: string, today: string): Promise<void> {
  const users = await accountNames(m);
  const userId = (name: string) => users.find((u) => u.displayName === name)?.id ?? null;
  const loads = new Map<string, number>();
  for (const j of plan.jars) loads.set(j.run.code, (loads.get(j.run.code) ?? 0) + 1);

  for (const r of plan.runs) {
    await setCookRunDetails(m, r.code, {
      vessel: vessels[r.container] ?? null,
      cookedOn: r.cookedOn,
      startedAt: new Date(labNoon(r.cookedOn, timeZone).getTime() + 3 * HOUR),
      minutesAtPressure: r.minutes,
      gaugeKPa,
      ventingMinutes: 10,
      altitudeM,
      container: r.container,
      loadCount: loads.get(r.code) ?? 0,
      operatorId: userId(r.operator),
      operatorName: r.operator,
    });
  }

  for (const s of plan.sessions) {
    await setSessionDetails(m, s.code, {
      startedAt: new Date(labNoon(s.heldOn, timeZone).getTime() + (s.startHour - 12) * HOUR),
      workspace: s.workspace,
    });
  }

  const firstUse = new Map<string, string>();
  for (const j of plan.jars)
    if (!firstUse.has(j.culture) || j.session.heldOn < firstUse.get(j.culture)!)
      firstUse.set(j.culture, j.session.heldOn);
  const cultureCodes = demoCultures.map((c) => c.code);
  const cultures = await culturesByCodes(m, cultureCodes);
  const cultureId = (code: string | undefined) => cultures.find((c) => c.code === code)?.id ?? null;
  for (const c of demoCultures) {
    const used = firstUse.get(c.code);
    await setCultureDetails(m, c.code, {
      species: c.species,
      strain: c.strain,
      generation: c.generation,
      volumeMl: c.volumeMl,
      parentCultureId: cultureId(c.parent),
      preparedOn: used ? addDays(used, -12) : null,
      state: c.weeks.to > 2 && c.code !== 'LC-0931' ? 'retired' : 'released',
    });
  }

  const labels = plan.jars.map((j) => j.label);
  const jars = await jarsByLabels(m, labels);
  const byLabel = new Map(jars.map((j) => [j.label, j]));
  const groups = new Map<string, number[]>();
  const group = (key: string, id: number) => groups.set(key, [...(groups.get(key) ?? []), id]);
  plan.jars.forEach((p, i) => {
    const jar = byLabel.get(p.label);
    if (!jar) return;
    // Each session's jars are shelved across both rooms, so a room never stands in for one session.
    group(`room|Incubation ${1 + (i % 2)}|${'ABC'[Math.floor(i / 2) % 3]}${1 + (Math.floor(i / 6) % 4)}`, jar.id);
    group(`ml|${p.run.container === '3 kg bag' ? 10 : 4}`, jar.id);
    const colonisedOn = addDays(p.session.heldOn, p.colonisesIn);
    if (jar.status === 'colonised' && colonisedOn <= today) group(`colonised|${colonisedOn}`, jar.id);
  });
  for (const [key, ids] of groups) {
    const [kind, a, b] = key.split('|');
    const set =
      kind === 'room' ? { room: a, shelf: b } : kind === 'ml' ? { inoculumMl: Number(a) } : { colonisedOn: a };
    await setJarDetails(m, ids, set);
  }

  for (const p of plan.jars) {
    const child = byLabel.get(p.label);
    const parent = p.parent && byLabel.get(p.parent.label);
    if (child && parent) await setParentJar(m, child.id, parent.id);
  }
}
