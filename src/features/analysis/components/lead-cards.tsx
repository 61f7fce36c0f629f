import { Link } from 'react-router';
import type { LeadDto } from '../../../../shared/schemas/analysis-causes';
import { paths } from '../../../config/paths';
import type { Period } from '../api/analysis-queries';
import { adjustedWords, crudeWords, levelWords, timesRest } from './cause-words';
import { factorLabels } from './labels';
import { countOf } from '../../../lib/count-text';

/** The leads first, each in plain words with its crude and adjusted figures; same-jars levels fold under it. */
export function LeadCards({ leads, period }: { leads: LeadDto[]; period: Period }) {
  if (leads.length === 0) {
    return (
      <p className="mb-6 rounded border border-line bg-surface p-4" data-testid="no-leads">
        No level stands out once the others are allowed for: nothing passes the bar in this period.
      </p>
    );
  }
  return (
    <section aria-labelledby="leads-heading" className="mb-6">
      <h2 id="leads-heading" className="mb-2 text-lg font-semibold">
        Leads, strongest first
      </h2>
      <ol className="grid gap-3">
        {leads.map((lead, i) => (
          <li
            key={`${lead.factor}:${lead.level}`}
            className="rounded border border-danger/30 bg-danger-soft/30 p-4"
            data-testid="lead"
          >
            <p className="text-sm text-muted">
              Lead {i + 1} · {factorLabels[lead.factor]}
            </p>
            <p className="text-lg font-semibold">{lead.level}</p>
            <p>
              {crudeWords(lead.row)}: {timesRest(lead.row.relativeRisk, lead.row.rr95)}.
            </p>
            <p className="font-medium">
              {lead.row.adjusted
                ? `${adjustedWords(lead.row.adjusted).replace(/^a/, 'A')}.`
                : 'No other lead to allow for.'}
            </p>
            {lead.row.incubating > 0 && (
              <p className="text-sm text-muted">
                {lead.row.incubating} of its jars are still incubating and not counted yet.
              </p>
            )}
            {lead.sameJars.length > 0 && (
              <details className="mt-2">
                <summary className="cursor-pointer text-sm">
                  {countOf(lead.sameJars.length, 'level holds', 'levels hold')} the same jars
                </summary>
                <p className="mt-1 text-sm">
                  {lead.sameJars.map(levelWords).join('; ')} — the data cannot tell these apart from {levelWords(lead)}.
                </p>
              </details>
            )}
            {lead.row.hint && <p className="mt-2 text-sm">{lead.row.hint}</p>}
            <Link
              className="mt-2 inline-block text-accent underline"
              to={paths.analysisJars.to({
                factor: lead.factor,
                level: lead.level,
                only: 'settled',
                from: period.from,
                to: period.to,
              })}
            >
              The {lead.row.jars} jars behind it
            </Link>
          </li>
        ))}
      </ol>
    </section>
  );
}
