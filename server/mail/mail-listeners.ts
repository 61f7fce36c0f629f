import { onIncidentCreated } from '../incidents/incident-events';
import { onIncidentFiled } from './incident-mail.service';

let unsubscribe: (() => void) | undefined;

/** Subscribes the mail module to incident events once per process, however many apps are built. */
export function registerMailListeners(): () => void {
  unsubscribe ??= onIncidentCreated((event) => onIncidentFiled(event.id));
  return () => {
    unsubscribe?.();
    unsubscribe = undefined;
  };
}
