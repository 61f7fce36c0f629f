import type { SVGProps } from 'react';

// Simple stroked glyphs drawn for Asepta; each is a list of path data on a 24-unit grid.
const glyphs = {
  home: ['M4 11 12 4l8 7', 'M6 9.5V20h12V9.5', 'M10 20v-5h4v5'],
  users: ['M9 11a3.5 3.5 0 1 0 0-7 3.5 3.5 0 0 0 0 7Z', 'M2.5 20a6.5 6.5 0 0 1 13 0', 'M16 4.5a3.5 3.5 0 0 1 0 6.5', 'M18 14.5a6.5 6.5 0 0 1 3.5 5.5'],
  account: ['M12 12a4 4 0 1 0 0-8 4 4 0 0 0 0 8Z', 'M4.5 20.5a7.5 7.5 0 0 1 15 0'],
  more: ['M5 12h.01', 'M12 12h.01', 'M19 12h.01'],
  menu: ['M4 6h16', 'M4 12h16', 'M4 18h16'],
  close: ['M6 6l12 12', 'M18 6 6 18'],
  'sign-out': ['M14 4h5v16h-5', 'M10 8l-4 4 4 4', 'M6 12h10'],
  plus: ['M12 5v14', 'M5 12h14'],
  search: ['M11 18a7 7 0 1 0 0-14 7 7 0 0 0 0 14Z', 'M16 16l4.5 4.5'],
  'chevron-left': ['M15 5l-7 7 7 7'],
  'chevron-right': ['M9 5l7 7-7 7'],
  'sort-asc': ['M12 6l-5 6h10Z'],
  'sort-desc': ['M12 18l5-6H7Z'],
  'sort-none': ['M12 4l-4 5h8Z', 'M12 20l4-5H8Z'],
  alert: ['M12 3 2 20h20Z', 'M12 10v4', 'M12 17h.01'],
  info: ['M12 21a9 9 0 1 0 0-18 9 9 0 0 0 0 18Z', 'M12 11v5', 'M12 8h.01'],
  check: ['M5 12.5 10 17l9-10'],
  inbox: ['M3 13h5l1.5 3h5L16 13h5', 'M5 5h14l2 8v6H3v-6Z'],
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
