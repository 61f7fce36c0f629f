import type { EntityManager } from 'typeorm';
import type { Actor } from '../audit/audit.service';
import { findGrainLot, insertGrainLot, insertPrepBatch, listGrains, prepBatchesByCodes } from '../grain/grain.service';
import { jarsByLabels, setJarDetails } from '../jars/jar-details.service';
import { addDays } from './demo-calendar';
import type { DemoPlan, PlanJar } from './demo-plan';
import { seededRandom } from './prng';

export interface PlanLot {
  grain: string;
  supplierLotCode: string;
  receivedOn: string;
}

export interface PlanBatch {
  code: string;
  lot: PlanLot;
  preparedOn: string;
  soakHours: number;
  simmerMinutes: number;
  drainMinutes: number;
  notes: string | null;
  jars: PlanJar[];
}

export interface DemoGrainPlan {
  lots: PlanLot[];
  batches: PlanBatch[];
}

const abbreviations: Record<string, string> = {
  rye: 'RY',
  sorghum: 'SG',
  'brown rice': 'BR',
  millet: 'ML',
  wheat: 'WH',
  maize: 'MZ',
  oats: 'OT',
};
/** A fresh delivery of each grain every four weeks. */
const LOT_DAYS = 28;
const compact = (date: string) => date.replace(/-/g, '').slice(2);

/** One prep batch per grain per cook day, each from the lot of that grain delivered last. */
export function planDemoGrain(plan: DemoPlan): DemoGrainPlan {
  const rng = seededRandom(0x96a1);
  const first = plan.runs[0]?.cookedOn ?? '';
  const block = (date: string) => Math.floor((Date.parse(date) - Date.parse(first)) / (LOT_DAYS * 86_400_000));
  const jarsByBatch = new Map<string, PlanJar[]>();
  for (const j of plan.jars) {
    const key = `${j.run.cookedOn}|${j.grain}`;
    jarsByBatch.set(key, [...(jarsByBatch.get(key) ?? []), j]);
  }
  const lots = new Map<string, PlanLot>();
  const batches = [...jarsByBatch.entries()]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([key, jars]): PlanBatch => {
      const [preparedOn = '', grain = ''] = key.split('|');
      const abbr = abbreviations[grain] ?? grain.slice(0, 2).toUpperCase();
      const lotKey = `${grain}|${block(preparedOn)}`;
      let lot = lots.get(lotKey);
      if (!lot) {
        const receivedOn = addDays(preparedOn, -rng.int(2, 6));
        lot = { grain, receivedOn, supplierLotCode: `${abbr}-${compact(receivedOn)}-${rng.int(10, 99)}` };
        lots.set(lotKey, lot);
      }
      const drainMinutes = rng.int(30, 90);
      return {
        code: `PB-${compact(preparedOn)}-${abbr}`,
        lot,
        preparedOn,
        soakHours: rng.pick([12, 14, 16, 18, 24]),
        simmerMinutes: rng.int(10, 20),
        drainMinutes,
        notes: drainMinutes > 75 ? 'Kernels still glossy after draining; surface-dried longer.' : null,
        jars,
      };
    });
  return { lots: [...lots.values()], batches };
}

/**
 * Records the plan's lots and prep batches through the grain services inside the loader's
 * transaction, then points each imported jar at its batch (history files carry no batch).
 */
export async function addDemoGrain(m: EntityManager, actor: Actor, plan: DemoGrainPlan): Promise<void> {
  const grainIds = new Map((await listGrains(m)).map((g) => [g.name.toLowerCase(), g.id]));
  const lotIds = new Map<PlanLot, number>();
  for (const lot of plan.lots) {
    const grainId = grainIds.get(lot.grain);
    if (grainId === undefined) throw new Error(`The demo grain ${lot.grain} is not on the grain list`);
    const stored = await findGrainLot(m, grainId, lot.supplierLotCode);
    const id =
      stored?.id ??
      (await insertGrainLot(m, actor, { grainId, supplierLotCode: lot.supplierLotCode, receivedOn: lot.receivedOn }))
        .id;
    lotIds.set(lot, id);
  }
  const batchCodes = plan.batches.map((b) => b.code);
  const stored = new Map((await prepBatchesByCodes(m, batchCodes)).map((b) => [b.code, b.id]));
  const labels = plan.batches.flatMap((b) => b.jars.map((j) => j.label));
  const jarIds = new Map((await jarsByLabels(m, labels)).map((j) => [j.label, j.id]));
  for (const b of plan.batches) {
    const id =
      stored.get(b.code) ??
      (
        await insertPrepBatch(m, actor, {
          code: b.code,
          grainLotId: lotIds.get(b.lot) ?? 0,
          preparedOn: b.preparedOn,
          soakHours: b.soakHours,
          simmerMinutes: b.simmerMinutes,
          drainMinutes: b.drainMinutes,
          notes: b.notes ?? undefined,
        })
      ).id;
    const ids = b.jars.flatMap((j) => jarIds.get(j.label) ?? []);
    await setJarDetails(m, ids, { prepBatchId: id });
  }
}
