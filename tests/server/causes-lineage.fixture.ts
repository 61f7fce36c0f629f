import { CookRun } from '../../server/cook-runs/cook-run.entity';
import { Culture } from '../../server/cultures/culture.entity';
import { dataSource } from '../../server/db/data-source';
import { Grain } from '../../server/grain/grain.entity';
import { IncidentJar } from '../../server/incidents/incident-jar.entity';
import { Incident } from '../../server/incidents/incident.entity';
import { JarEvent } from '../../server/jars/jar-event.entity';
import { Jar } from '../../server/jars/jar.entity';
import { InoculationSession } from '../../server/sessions/inoculation-session.entity';
import { addDays, isoWeekLabel } from './analysis-planted.fixture';
import { rebuildTallies } from '../../server/tallies/tallies.service';

/** What the analysis should see of one jar, worked out here independently of the server's SQL. */
export interface PlantedJar {
  cookRun: string;
  session: string;
  operator: string;
  culture: string;
  transfers: '0' | '1' | '2+';
  room: string;
  week: string;
  contaminated: boolean;
}

export const lineagePlan = {
  badRun: 'LX-CR-BAD',
  badCulture: 'LX-LC-BAD',
  /** Works little, but her one double session went through the bad run. */
  innocent: 'Ilse Varga',
  quarantine: 'Quarantine',
  firstMonday: '2025-01-06',
  weeks: 6,
};

const cultures = ['LX-LC-1', 'LX-LC-2', 'LX-LC-3', lineagePlan.badCulture];
const others = ['Anke Doll', 'Bela Sørum', 'Cyan Weir'];
const rooms = ['Room A', 'Room B'];
const m = () => dataSource.manager;
const at = (date: string, hour: number) => new Date(`${date}T${String(hour).padStart(2, '0')}:00:00Z`);

/**
 * Invented history: a bad cook run (70 % lost) that went mostly to one operator who works little; a
 * bad culture whose jars are mostly made grain-to-grain from its master jars (cultureId empty); every
 * contaminated jar moved to a quarantine room two hours after it was found; some clean jars moved
 * between incubation rooms inside their observation window, and some after it.
 */
export async function plantLineageHistory(): Promise<PlantedJar[]> {
  const grain = await m().findOneByOrFail(Grain, { name: 'rye' });
  const cultureIds = new Map<string, number>();
  for (const code of cultures)
    cultureIds.set(code, (await m().save(m().create(Culture, { code, state: 'released' }))).id);
  const planted: PlantedJar[] = [];
  const counters = { bad: 0, culture: 0, background: 0 };
  let label = 0;

  const masterSession = await m().save(
    m().create(InoculationSession, {
      code: 'LX-S-MASTER',
      heldOn: '2025-01-02',
      operatorName: others[0]!,
      workspace: 'flow-hood',
    }),
  );
  const masterRun = await m().save(m().create(CookRun, { code: 'LX-CR-MASTER', minutesAtPressure: 90, altitudeM: 0 }));
  /** Per culture: the first-generation jar (from the culture) and the second (from the first). */
  const parents = new Map<string, { first: number; second: number }>();
  for (const code of cultures) {
    const base = { grainId: grain.id, cookRunId: masterRun.id, sessionId: masterSession.id, room: 'Room A' };
    const first = await m().save(
      m().create(Jar, {
        ...base,
        label: `LX-M-${code}`,
        cultureId: cultureIds.get(code)!,
        inoculatedAt: at('2025-01-02', 9),
        inoculatedOn: '2025-01-02',
      }),
    );
    const second = await m().save(
      m().create(Jar, {
        ...base,
        label: `LX-G-${code}`,
        parentJarId: first.id,
        inoculatedAt: at('2025-01-02', 10),
        inoculatedOn: '2025-01-02',
      }),
    );
    parents.set(code, { first: first.id, second: second.id });
    for (const [transfers] of [['0'], ['1']] as const)
      planted.push({
        cookRun: 'LX-CR-MASTER',
        session: 'LX-S-MASTER',
        operator: others[0]!,
        culture: code,
        transfers,
        room: 'Room A',
        week: isoWeekLabel('2025-01-02'),
        contaminated: false,
      });
  }

  for (let w = 0; w < lineagePlan.weeks; w++) {
    for (const [d, offset] of [1, 3].entries()) {
      const day = addDays(lineagePlan.firstMonday, 7 * w + offset);
      const bad = w === 3 && d === 1;
      const run = await m().save(
        m().create(CookRun, { code: bad ? lineagePlan.badRun : `LX-CR-${w}${d}`, minutesAtPressure: 90, altitudeM: 0 }),
      );
      const crew = [...others.map((o) => ({ operator: o, jars: bad ? 4 : 12 }))];
      if (bad) crew.push({ operator: lineagePlan.innocent, jars: 36 });
      else if (d === 0 && w > 0) crew.push({ operator: lineagePlan.innocent, jars: 12 });
      for (const [o, member] of crew.entries()) {
        const session = await m().save(
          m().create(InoculationSession, {
            code: `LX-S-${w}${d}${o}`,
            heldOn: day,
            operatorName: member.operator,
            workspace: 'flow-hood',
          }),
        );
        for (let k = 0; k < member.jars; k++) {
          const culture = cultures[(k + o + w) % cultures.length]!;
          const transfers = k % 3 === 0 ? '0' : k % 3 === 1 ? '1' : '2+';
          const startRoom = rooms[k % 2]!;
          let contaminated: boolean;
          if (bad) contaminated = counters.bad++ % 10 < 7;
          else if (culture === lineagePlan.badCulture) contaminated = counters.culture++ % 5 < 2;
          else contaminated = counters.background++ % 20 === 0;
          const jar = await m().save(
            m().create(Jar, {
              label: `LX-${String(label++).padStart(4, '0')}`,
              grainId: grain.id,
              cookRunId: run.id,
              sessionId: session.id,
              cultureId: transfers === '0' ? cultureIds.get(culture)! : null,
              parentJarId:
                transfers === '1'
                  ? parents.get(culture)!.first
                  : transfers === '2+'
                    ? parents.get(culture)!.second
                    : null,
              room: startRoom,
              inoculatedAt: at(day, 9),
              inoculatedOn: day,
            }),
          );
          let room = startRoom;
          const moves: { on: string; hour: number; to: string }[] = [];
          // Inside the window (day 3): the jar counts where it went; after it (day 30): where it was.
          if (k % 6 === 5) {
            room = rooms[(k + 1) % 2]!;
            moves.push({ on: addDays(day, 3), hour: 8, to: room });
          }
          if (!contaminated && k % 6 === 4) moves.push({ on: addDays(day, 30), hour: 8, to: 'Room C' });
          const found = bad ? addDays(day, 4) : culture === lineagePlan.badCulture ? addDays(day, 5) : addDays(day, 12);
          if (contaminated) {
            const incident = await m().save(
              m().create(Incident, {
                foundAt: at(found, 9),
                foundOn: found,
                foundByName: 'Test finder',
                contaminant: bad ? 'bacterial' : culture === lineagePlan.badCulture ? 'yeast' : 'penicillium',
                verdict: 'confirmed',
              }),
            );
            await m().insert(IncidentJar, { incidentId: incident.id, jarId: jar.id });
            moves.push({ on: found, hour: 11, to: lineagePlan.quarantine });
          }
          let from = startRoom;
          for (const mv of moves) {
            await m().insert(JarEvent, {
              jarId: jar.id,
              type: 'moved',
              at: at(mv.on, mv.hour),
              onDate: mv.on,
              byName: 'Test mover',
              room: mv.to,
              fromRoom: from,
              shelf: 'S1',
            });
            from = mv.to;
          }
          if (moves.length) await m().update(Jar, { id: jar.id }, { room: from });
          planted.push({
            cookRun: run.code,
            session: session.code,
            operator: member.operator,
            culture,
            transfers,
            room,
            week: isoWeekLabel(day),
            contaminated,
          });
        }
      }
    }
  }
  // Planted beside the modules' write paths (moves and lineage by hand), so counted afresh here.
  await rebuildTallies();
  return planted;
}
