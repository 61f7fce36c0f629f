import type { JarStatus } from '../../shared/enums';
import { jarEventAllowedFrom, type JarEventInputType } from '../../shared/schemas/jar-events';
import { conflict } from '../core/errors';

const statusWords: Record<JarStatus, string> = {
  incubating: 'an incubating',
  colonised: 'a colonised',
  contaminated: 'a contaminated',
  'on-hold': 'an on-hold',
  discarded: 'a discarded',
  released: 'a released',
};

const verbs: Record<JarEventInputType, string> = {
  check: 'checked',
  shaken: 'shaken',
  moved: 'moved',
  released: 'released',
  hold: 'put on hold',
  discarded: 'discarded',
  colonised: 'marked colonised',
  resume: 'taken off hold',
};

export interface JarState {
  status: JarStatus;
  colonisedOn: string | null;
}

export const canRecord = (type: JarEventInputType, status: JarStatus) => jarEventAllowedFrom[type].includes(status);

/** The status after the event, or a 409 naming `type` when the jar's life does not allow it. */
export function statusAfter(jar: JarState, type: JarEventInputType, path = 'type'): JarStatus {
  if (!canRecord(type, jar.status)) {
    const message = `${statusWords[jar.status]} jar cannot be ${verbs[type]}`.replace(/^./, (c) => c.toUpperCase());
    throw conflict(`${path}: ${message}.`, [{ path, message }]);
  }
  switch (type) {
    case 'colonised':
      return 'colonised';
    case 'released':
      return 'released';
    case 'hold':
      return 'on-hold';
    case 'discarded':
      return 'discarded';
    case 'resume':
      return jar.colonisedOn ? 'colonised' : 'incubating';
    default:
      return jar.status;
  }
}

/** Jars that a lineage hold puts on hold; contaminated ones are already out of production. */
export const holdable: readonly JarStatus[] = ['incubating', 'colonised'];
