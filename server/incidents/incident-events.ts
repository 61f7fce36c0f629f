import type { Contaminant, IncidentSeverity, StageFound } from '../../shared/enums';
import { logger } from '../core/logger';

export interface IncidentCreatedEvent {
  id: number;
  contaminant: Contaminant;
  severity: IncidentSeverity;
  stage: StageFound;
  foundAt: string;
  foundByName: string;
  jarLabels: string[];
}

type Listener<E> = (event: E) => void | Promise<void>;

function hookList<E>() {
  const listeners = new Set<Listener<E>>();
  return {
    /** Returns an unsubscribe function. */
    on: (listener: Listener<E>): (() => void) => {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    /** Called after commit; a failing listener (mail down) never undoes or fails the request. */
    emit: (event: E): void => {
      for (const listener of listeners) {
        void Promise.resolve()
          .then(() => listener(event))
          .catch((err: unknown) =>
            logger.error({ err, incidentId: (event as { id?: number }).id }, 'incident listener failed'),
          );
      }
    },
  };
}

const created = hookList<IncidentCreatedEvent>();

export const onIncidentCreated = created.on;
export const emitIncidentCreated = created.emit;
