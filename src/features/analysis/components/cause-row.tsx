import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { CauseRow, Standing } from '../../../../shared/schemas/analysis-causes';
import type { FactorLevel } from '../../../../shared/schemas/analysis';
import { Badge } from '../../../components/ui/badge';
import { paths } from '../../../config/paths';
import { cx } from '../../../lib/cx';
import type { Period } from '../api/analysis-queries';
import { num } from './analysis-frame';
import { standingWords } from './cause-words';
import { factorLabels, formatP, percent, ratio } from './labels';
import { countOf } from '../../../lib/count-text';

const standingBadge: Record<Standing, { tone: 'danger' | 'warn' | 'neutral' | 'ok'; label: string }> = {
  lead: { tone: 'danger', label: 'Lead' },
  'same-jars': { tone: 'warn', label: 'Same jars as a lead' },
  elevated: { tone: 'warn', label: 'Elevated' },
  explained: { tone: 'neutral', label: 'Explained' },
  'not-elevated': { tone: 'ok', label: 'Not elevated' },
};

// On phones each row becomes a card: the level on top, the three figures side by side, each led by its
// column's name, then the hint.
const cell = cx(
  'px-3 py-2 border-t border-line align-top',
  'max-sm:block max-sm:border-t-0 max-sm:px-0 max-sm:py-1',
  'max-sm:before:block max-sm:before:text-sm max-sm:before:font-medium max-sm:before:text-muted max-sm:before:content-[attr(data-label)]',
);
const figure = cx(cell, num, 'sm:whitespace-nowrap max-sm:text-left');
const wide = 'max-sm:col-span-3 max-sm:before:hidden';

function JarsLink({
  row,
  period,
  only,
  children,
}: {
  row: CauseRow;
  period: Period;
  only: 'settled' | 'contaminated';
  children: ReactNode;
}) {
  return (
    <Link
      to={paths.analysisJars.to({ factor: row.factor, level: row.level, only, from: period.from, to: period.to })}
      className="text-accent underline"
    >
      {children}
    </Link>
  );
}

/** The first sentence of a hint and the rest; decimals ("4.5 days") do not end a sentence. */
export function splitHint(hint: string): [string, string] {
  const end = hint.search(/\.\s/);
  return end < 0 ? [hint, ''] : [hint.slice(0, end + 1), hint.slice(end + 2)];
}

function SameJars({ levels }: { levels: FactorLevel[] }) {
  return (
    <p className="mt-1 text-sm">
      <span className="font-medium">Same jars as: </span>
      {levels.map((c) => `${factorLabels[c.factor]} ${c.level}`).join(', ')}
    </p>
  );
}

function Hint({ hint, basis, sameJars }: { hint: string; basis: string | null; sameJars: FactorLevel[] }) {
  const [first, rest] = splitHint(hint);
  return (
    <details className="group">
      <summary className="cursor-pointer">
        {first}{' '}
        {sameJars.length > 0 && (
          <span className="text-sm text-muted">· same jars as {countOf(sameJars.length, 'other level')} </span>
        )}
        <span className="text-sm text-accent underline group-open:hidden">More</span>
      </summary>
      {rest && <p className="mt-1">{rest}</p>}
      {sameJars.length > 0 && <SameJars levels={sameJars} />}
      <p className="mt-1 text-sm text-muted">
        <Badge tone="neutral">Hint</Badge> {basis}
      </p>
    </details>
  );
}

export function CauseRowView({
  row,
  rank,
  period,
  leads,
}: {
  row: CauseRow;
  rank: number;
  period: Period;
  leads: FactorLevel[];
}) {
  const strong = row.standing === 'lead' || row.standing === 'elevated';
  const badge = standingBadge[row.standing];
  return (
    <tr
      data-testid="cause-row"
      className={cx(
        'max-sm:grid max-sm:grid-cols-3 max-sm:gap-x-3 max-sm:border-t-2 max-sm:border-line max-sm:px-3 max-sm:py-2',
        strong && 'bg-danger-soft/40',
      )}
    >
      <td className={cx(cell, num, 'text-muted max-sm:hidden')}>{rank}</td>
      <th scope="row" className={cx(cell, wide, 'text-left')}>
        <span className="block text-sm font-normal text-muted">
          <span className="sm:hidden">#{rank} · </span>
          {factorLabels[row.factor]}
        </span>
        <span className="font-semibold" data-testid="cause-level">
          {row.level}
        </span>
        <span className="mt-1 block">
          <Badge tone={badge.tone}>{badge.label}</Badge>
        </span>
      </th>
      <td className={figure} data-label="Contaminated">
        <JarsLink row={row} period={period} only="contaminated">
          {row.contaminated}
        </JarsLink>{' '}
        of{' '}
        <JarsLink row={row} period={period} only="settled">
          {row.jars}
        </JarsLink>
        <span className="block text-sm text-muted">
          {percent(row.rate)} vs {percent(row.restRate)} in the rest
        </span>
        {row.incubating > 0 && <span className="block text-sm text-muted">+{row.incubating} still incubating</span>}
      </td>
      <td className={figure} data-label="Relative risk">
        <span className="font-semibold">{ratio(row.relativeRisk)}</span>
        <span className="block text-sm text-muted">
          {ratio(row.rr95[0])} – {ratio(row.rr95[1])}
        </span>
        {row.adjusted && (
          <span className="block text-sm" data-testid="cause-adjusted">
            adjusted {ratio(row.adjusted.relativeRisk)} ({ratio(row.adjusted.rr95[0])} – {ratio(row.adjusted.rr95[1])})
          </span>
        )}
      </td>
      <td className={figure} data-label="q (BH)">
        {formatP(row.qValue)}
        <span className="block text-sm text-muted">p {formatP(row.pValue)}</span>
      </td>
      <td className={cx(cell, wide, 'min-w-80')}>
        <p className="mb-1" data-testid="cause-standing">
          {standingWords(row, leads)}
        </p>
        {row.hint && row.standing !== 'not-elevated' && (
          <Hint hint={row.hint} basis={row.hintBasis} sameJars={row.sameJarsAs} />
        )}
      </td>
    </tr>
  );
}
