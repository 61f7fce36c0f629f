import type { JarEventInputType } from '../../../../shared/schemas/jar-events';

/** The jar page's event buttons; kept apart from the dialog so the page can show them before the form's code arrives. */
export const eventActions: Record<JarEventInputType, { label: string; title: string; done: string }> = {
  check: { label: 'Check', title: 'Record a check', done: 'Check recorded.' },
  shaken: { label: 'Shaken', title: 'Mark as shaken', done: 'Marked as shaken.' },
  colonised: { label: 'Colonised', title: 'Mark fully colonised', done: 'Marked fully colonised.' },
  moved: { label: 'Move', title: 'Move to another shelf', done: 'Jar moved.' },
  released: { label: 'Release', title: 'Release the jar', done: 'Jar released.' },
  hold: { label: 'Hold', title: 'Put the jar on hold', done: 'Jar put on hold.' },
  discarded: { label: 'Discard', title: 'Discard the jar', done: 'Jar discarded.' },
  resume: { label: 'Take off hold', title: 'Take the jar off hold', done: 'Jar taken off hold.' },
};
