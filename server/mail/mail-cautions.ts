import type { MailBlock } from './mail-layout';

/** The product's cautions (DESIGN.md §7) as mail blocks; mails that touch the hazard carry them. */
export const mailCautions = {
  spores: {
    kind: 'caution',
    title: 'Mould spores',
    text: 'Do not open contaminated jars indoors. Staff who are sensitive to spores should wear a fitted respirator when handling contaminated material.',
  },
  disposal: {
    kind: 'caution',
    title: 'Disposal',
    text: 'Sterilise contaminated jars, still sealed, before they are opened, emptied or washed.',
  },
  flame: {
    kind: 'caution',
    title: 'Alcohol and flame',
    text: 'Let 70 % isopropyl alcohol dry fully before any flame; keep flame away from a wet wipe-down or an open bottle.',
  },
  pressure: {
    kind: 'caution',
    title: 'Pressure vessels',
    text: 'Never open a pressure cooker or autoclave under pressure; let it depressurise by itself and follow the maker’s manual.',
  },
  deferral: {
    kind: 'p',
    text: 'These are reminders and leads, not a diagnosis: local codes, the equipment maker’s instructions and licensed practice take precedence.',
  },
} satisfies Record<string, MailBlock>;
