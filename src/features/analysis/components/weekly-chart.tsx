import {
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { WeeklyDto, WeeklyRow } from '../../../../shared/schemas/analysis-weekly';
import { percent } from './labels';

interface DotProps {
  cx?: number;
  cy?: number;
  payload?: WeeklyRow;
}

/** Out-of-control weeks are drawn large and red; provisional weeks hollow, since their rate will still rise. */
function WeekDot({ cx, cy, payload }: DotProps) {
  if (cx === undefined || cy === undefined || !payload) return null;
  if (payload.outOfControl) {
    return (
      <circle cx={cx} cy={cy} r={7} fill="#a4261c" stroke="#841c14" strokeWidth={2}>
        <title>{`${payload.week} out of control`}</title>
      </circle>
    );
  }
  if (payload.belowLcl) {
    return (
      <circle cx={cx} cy={cy} r={6} fill="#1d6b3a" stroke="#ffffff" strokeWidth={2}>
        <title>{`${payload.week} below the lower limit`}</title>
      </circle>
    );
  }
  if (payload.provisional) return <circle cx={cx} cy={cy} r={5} fill="#ffffff" stroke="#13627a" strokeWidth={2} />;
  return <circle cx={cx} cy={cy} r={4} fill="#13627a" />;
}

/** The p-chart: weekly rate against 3-sigma limits for each week's own number of jars (Montgomery, ch. 7). */
export function WeeklyChart({ data, onWeek }: { data: WeeklyDto; onWeek?: (week: string) => void }) {
  return (
    <figure className="mb-8 rounded-lg border-2 border-line bg-surface-raised p-4">
      <figcaption className="mb-2 font-semibold">
        p-chart: contaminated share per ISO week{data.pBar !== null && <> · centre line p̄ = {percent(data.pBar)}</>} ·
        lab target {percent(data.target)}
      </figcaption>
      <div className="h-72 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart
            data={data.weeks}
            margin={{ top: 8, right: 16, bottom: 8, left: 8 }}
            className={onWeek ? 'cursor-pointer' : undefined}
            onClick={(state) => {
              if (onWeek && state?.activeLabel !== undefined) onWeek(String(state.activeLabel));
            }}
          >
            <CartesianGrid stroke="#d3dad6" strokeDasharray="3 3" />
            <XAxis dataKey="week" tick={{ fontSize: 12 }} />
            <YAxis tickFormatter={(v: number) => percent(v)} width={64} tick={{ fontSize: 12 }} />
            <Tooltip formatter={(v) => percent(Number(v))} />
            <Line
              type="stepAfter"
              dataKey="ucl"
              name="Upper limit"
              stroke="#8a5300"
              strokeDasharray="6 4"
              dot={false}
              isAnimationActive={false}
            />
            <Line
              type="stepAfter"
              dataKey="lcl"
              name="Lower limit"
              stroke="#8a5300"
              strokeDasharray="6 4"
              dot={false}
              isAnimationActive={false}
            />
            {data.pBar !== null && (
              <ReferenceLine y={data.pBar} stroke="#4f5c56" label={{ value: 'p̄', position: 'right' }} />
            )}
            <ReferenceLine
              y={data.target}
              stroke="#a4261c"
              strokeDasharray="2 3"
              label={{ value: 'target', position: 'insideTopRight' }}
            />
            <Line
              type="linear"
              dataKey="rate"
              name="Rate"
              stroke="#13627a"
              strokeWidth={2}
              dot={<WeekDot />}
              isAnimationActive={false}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <p className="mt-2 text-sm text-muted">
        Red dots: weeks outside their limits. Red dotted line: the rate the lab accepts. Click a week to open its jars
        (the table’s numbers do the same from the keyboard). Hollow dots: provisional weeks that still hold incubating
        jars; they are left out of p̄ and never flagged.
      </p>
    </figure>
  );
}
