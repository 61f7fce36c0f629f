export interface Caution {
  id: 'pressure' | 'flame' | 'spores' | 'disposal';
  title: string;
  text: string;
}

/** Product-wide safety cautions; screens about cooking, inoculating or disposal repeat the one that applies. */
export const cautions: Caution[] = [
  {
    id: 'pressure',
    title: 'Pressure vessels',
    text: 'Never open a pressure cooker or autoclave while it is under pressure. Follow the maker’s manual and your local pressure-equipment rules.',
  },
  {
    id: 'flame',
    title: 'Alcohol and flame',
    text: 'Let 70 % alcohol dry fully before you flame a needle, and keep flame away from a wet wipe-down.',
  },
  {
    id: 'spores',
    title: 'Mould spores',
    text: 'Do not open contaminated jars indoors. Staff who are sensitive to spores should wear respiratory protection.',
  },
  {
    id: 'disposal',
    title: 'Disposal',
    text: 'Sterilise contaminated jars before they are thrown out or washed.',
  },
];

export const cautionFootnote =
  'Asepta’s hints are hints, not a diagnosis. Local codes, the equipment maker’s instructions and licensed practice come first.';
