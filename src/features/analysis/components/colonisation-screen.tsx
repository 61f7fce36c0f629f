import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { PageHeader } from '../../../components/ui/page-header';
import { analysisQueries, csvUrl, readPeriod } from '../api/analysis-queries';
import { AnalysisTabs, CsvLink, LoadState, PeriodPicker, Table, num, td, th } from './analysis-frame';
import { percent } from './labels';

const palette = ['#13627a', '#a4261c', '#1f6a3c', '#8a5300', '#5b3f8c', '#4f5c56', '#0d4a5c', '#841c14'];

/** Days from inoculation to full colonisation per grain (Kaplan–Meier), jars that never got there censored. */
export function ColonisationScreen() {
  const [params] = useSearchParams();
  const period = readPeriod(params);
  const km = useQuery(analysisQueries.colonisation(period));
  const curves = km.data?.curves ?? [];

  return (
    <>
      <PageHeader
        title="Colonisation time"
        description="The share of jars fully colonised by each day after inoculation, per grain. Jars that turned, were discarded or are still incubating count until their last known day."
        actions={<CsvLink href={csvUrl('colonisation', { ...period })} />}
      />
      <AnalysisTabs />
      <PeriodPicker period={period} />
      <LoadState
        query={km}
        isEmpty={curves.length === 0}
        emptyTitle="No jars with a known colonisation day in this period."
      >
        <figure className="mb-6 rounded-lg border-2 border-line bg-surface-raised p-4">
          <figcaption className="mb-2 font-semibold">
            Share colonised by day after inoculation (Kaplan–Meier)
          </figcaption>
          <div className="h-80 w-full">
            <ResponsiveContainer width="100%" height="100%">
              <LineChart margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
                <CartesianGrid stroke="#d3dad6" strokeDasharray="3 3" />
                <XAxis
                  type="number"
                  dataKey="day"
                  domain={[0, 'dataMax']}
                  allowDuplicatedCategory={false}
                  tick={{ fontSize: 12 }}
                  label={{ value: 'days', position: 'insideBottomRight', offset: -4 }}
                />
                <YAxis domain={[0, 1]} tickFormatter={(v: number) => percent(v)} width={64} tick={{ fontSize: 12 }} />
                <Tooltip
                  formatter={(v) => percent(Number(v))}
                  labelFormatter={(d) => `day ${typeof d === 'number' || typeof d === 'string' ? d : ''}`}
                />
                <Legend />
                {curves.map((c, i) => (
                  <Line
                    key={c.grain}
                    name={c.grain}
                    type="stepAfter"
                    data={[
                      { day: 0, colonisedShare: 0 },
                      ...c.steps.map((s) => ({ day: s.day, colonisedShare: 1 - s.stillColonising })),
                    ]}
                    dataKey="colonisedShare"
                    stroke={palette[i % palette.length]}
                    strokeWidth={2}
                    dot={false}
                    isAnimationActive={false}
                  />
                ))}
              </LineChart>
            </ResponsiveContainer>
          </div>
        </figure>
        <Table caption="Colonisation time per grain">
          <thead>
            <tr>
              <th scope="col" className={th}>
                Grain
              </th>
              <th scope="col" className={`${th} ${num}`}>
                Jars
              </th>
              <th scope="col" className={`${th} ${num}`}>
                Colonised
              </th>
              <th scope="col" className={`${th} ${num}`}>
                Censored
              </th>
              <th scope="col" className={`${th} ${num}`}>
                Median days
              </th>
            </tr>
          </thead>
          <tbody>
            {curves.map((c) => (
              <tr key={c.grain}>
                <th scope="row" className={`${td} font-semibold`}>
                  {c.grain}
                </th>
                <td className={`${td} ${num}`}>{c.jars}</td>
                <td className={`${td} ${num}`}>{c.colonised}</td>
                <td className={`${td} ${num}`}>{c.censored}</td>
                <td className={`${td} ${num} font-semibold`}>{c.medianDays ?? 'not reached'}</td>
              </tr>
            ))}
          </tbody>
        </Table>
        <p className="mt-3 text-sm text-muted">
          Product-limit estimate (Kaplan & Meier, 1958). Jars marked colonised without a colonisation date, such as
          imported history, are left out: their day is not known.
        </p>
      </LoadState>
    </>
  );
}
