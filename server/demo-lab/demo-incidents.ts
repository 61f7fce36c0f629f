import { anyFiledIncident, createIncident } from '../incidents/incidents.service';
import { labNoon } from '../imports/lab-noon';
import { findUserByUsername } from '../users/users.service';
import type { Contaminant } from '../../shared/enums';
import { addDays } from './demo-calendar';
import type { DemoPlan } from './demo-plan';
import { seededRandom } from './prng';

const findings: { contaminant: Contaminant; colour: string; smell: string | null; texture: string; days: number }[] = [
  {
    contaminant: 'trichoderma',
    colour: 'green powdery patch beside the port',
    smell: null,
    texture: 'dense white edge',
    days: 6,
  },
  {
    contaminant: 'bacterial',
    colour: 'grey, cloudy liquid at the base',
    smell: 'sour',
    texture: 'wet, greasy kernels',
    days: 3,
  },
  {
    contaminant: 'penicillium',
    colour: 'blue-green spots on the surface',
    smell: 'musty',
    texture: 'powdery',
    days: 5,
  },
  { contaminant: 'unknown', colour: 'yellowish film on a few kernels', smell: null, texture: 'slimy', days: 4 },
];

/**
 * A few jars flagged at the shelf in the last week and not yet reviewed, through the incidents
 * service as a technician would file them; skipped once the register holds any filed incident.
 */
export async function loadOpenIncidents(plan: DemoPlan, today: string, timeZone: string, log: (line: string) => void) {
  if (await anyFiledIncident()) return;
  const tech = await findUserByUsername('technician');
  if (!tech) return;
  const rng = seededRandom(0x0f1a6);
  const candidates = plan.jars.filter(
    (j) =>
      !j.contaminant && !j.parent && j.session.heldOn >= addDays(today, -9) && j.session.heldOn <= addDays(today, -3),
  );
  const chosen = rng.shuffle(candidates).slice(0, findings.length);
  for (const [i, jar] of chosen.entries()) {
    const f = findings[i]!;
    const foundOn = [addDays(jar.session.heldOn, f.days), addDays(today, -1)].sort()[0]!;
    await createIncident(
      {
        id: tech.id,
        username: tech.username,
        displayName: tech.displayName,
        email: tech.email,
        role: tech.role,
        mustChangePassword: false,
      },
      {
        jarLabels: [jar.label],
        contaminant: f.contaminant,
        signColour: f.colour,
        signSmell: f.smell ?? undefined,
        signTexture: f.texture,
        severity: f.contaminant === 'bacterial' ? 'high' : 'medium',
        stage: 'incubation',
        foundAt: labNoon(foundOn, timeZone).toISOString(),
        sealed: true,
        sterilisedBeforeDisposal: false,
        notes: 'Bagged and set aside, unopened, for review.',
      },
    );
  }
  log(`Demo lab: flagged ${chosen.length} jars for review`);
}
