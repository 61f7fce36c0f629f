import type { SVGProps } from 'react';

// Simple stroked glyphs drawn for Asepta; each is a list of path data on a 24-unit grid.
const glyphs = {
  home: ['M4 11 12 4l8 7', 'M6 9.5V20h12V9.5', 'M10 20v-5h4v5'],
  users: [
    'M9 11a3.5 3.5 0 1 0 0-7 3.5 3.5 0 0 0 0 7Z',
    'M2.5 20a6.5 6.5 0 0 1 13 0',
    'M16 4.5a3.5 3.5 0 0 1 0 6.5',
    'M18 14.5a6.5 6.5 0 0 1 3.5 5.5',
  ],
  account: ['M12 12a4 4 0 1 0 0-8 4 4 0 0 0 0 8Z', 'M4.5 20.5a7.5 7.5 0 0 1 15 0'],
  more: ['M5 12h.01', 'M12 12h.01', 'M19 12h.01'],
  menu: ['M4 6h16', 'M4 12h16', 'M4 18h16'],
  close: ['M6 6l12 12', 'M18 6 6 18'],
  'sign-out': ['M14 4h5v16h-5', 'M10 8l-4 4 4 4', 'M6 12h10'],
  plus: ['M12 5v14', 'M5 12h14'],
  search: ['M11 18a7 7 0 1 0 0-14 7 7 0 0 0 0 14Z', 'M16 16l4.5 4.5'],
  scan: ['M4 8V4h4', 'M16 4h4v4', 'M20 16v4h-4', 'M8 20H4v-4', 'M4 12h16'],
  'chevron-left': ['M15 5l-7 7 7 7'],
  'chevron-right': ['M9 5l7 7-7 7'],
  'sort-asc': ['M12 6l-5 6h10Z'],
  'sort-desc': ['M12 18l5-6H7Z'],
  'sort-none': ['M12 4l-4 5h8Z', 'M12 20l4-5H8Z'],
  alert: ['M12 3 2 20h20Z', 'M12 10v4', 'M12 17h.01'],
  info: ['M12 21a9 9 0 1 0 0-18 9 9 0 0 0 0 18Z', 'M12 11v5', 'M12 8h.01'],
  check: ['M5 12.5 10 17l9-10'],
  inbox: ['M3 13h5l1.5 3h5L16 13h5', 'M5 5h14l2 8v6H3v-6Z'],
  flame: ['M12 21a6 6 0 0 0 6-6c0-4-3-6-4-10-2 2-2 4-2 6-1-1-2-2-2-4-2 2-4 4-4 8a6 6 0 0 0 6 6Z'],
  flask: ['M9 3h6', 'M10 3v6l-5 9a2 2 0 0 0 1.7 3h10.6a2 2 0 0 0 1.7-3l-5-9V3', 'M7.5 15h9'],
  syringe: ['M18 2l4 4', 'M20 4l-9 9', 'M15 6l3 3', 'M13 8 5 16v3h3l8-8', 'M5 19l-3 3'],
  grain: [
    'M12 21V9',
    'M12 9c-3 0-4-2-4-5 3 0 4 2 4 5Z',
    'M12 9c3 0 4-2 4-5-3 0-4 2-4 5Z',
    'M12 15c-3 0-4-2-4-5 3 0 4 2 4 5Z',
    'M12 15c3 0 4-2 4-5-3 0-4 2-4 5Z',
  ],
  jar: ['M8 3h8v3H8Z', 'M7 6h10a1 1 0 0 1 1 1v12a2 2 0 0 1-2 2H8a2 2 0 0 1-2-2V7a1 1 0 0 1 1-1Z', 'M6 11h12'],
  shelf: ['M3 10h18', 'M3 20h18', 'M5 10V4h4v6', 'M11 10V6h3v4', 'M6 20v-6h3v6', 'M12 20v-7h4v7'],
  upload: ['M12 16V4', 'M7 9l5-5 5 5', 'M4 16v4h16v-4'],
  settings: [
    'M12 15a3 3 0 1 0 0-6 3 3 0 0 0 0 6Z',
    'M12 2v3',
    'M12 19v3',
    'M2 12h3',
    'M19 12h3',
    'M4.9 4.9 7 7',
    'M17 17l2.1 2.1',
    'M4.9 19.1 7 17',
    'M17 7l2.1-2.1',
  ],
  chart: ['M4 20V4', 'M4 20h16', 'M8 16v-5', 'M12 16V8', 'M16 16v-3'],
  calendar: ['M4 6h16v14H4Z', 'M4 10h16', 'M8 3v5', 'M16 3v5'],
  list: ['M9 6h11', 'M9 12h11', 'M9 18h11', 'M4.5 6h.01', 'M4.5 12h.01', 'M4.5 18h.01'],
  mail: ['M3 6h18v12H3Z', 'M3 7l9 6 9-6'],
} as const;

export type IconName = keyof typeof glyphs;

interface IconProps extends SVGProps<SVGSVGElement> {
  name: IconName;
  size?: number;
}

export function Icon({ name, size = 24, ...props }: IconProps) {
  const filled = name.startsWith('sort-');
  return (
    <svg
      width={size}
      height={size}
      viewBox="0 0 24 24"
      fill={filled ? 'currentColor' : 'none'}
      stroke={filled ? 'none' : 'currentColor'}
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
      focusable="false"
      {...props}
    >
      {glyphs[name].map((d) => (
        <path key={d} d={d} />
      ))}
    </svg>
  );
}
