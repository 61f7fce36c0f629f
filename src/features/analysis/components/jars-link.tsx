import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { Factor } from '../../../../shared/enums';
import { paths } from '../../../config/paths';
import type { JarsOnly, Period } from '../api/analysis-queries';

export interface JarsTarget {
  factor: Factor;
  level: string;
  factor2?: Factor;
  level2?: string;
  only?: JarsOnly;
  period: Period;
}

export const jarsBehindPath = ({ period, only, ...t }: JarsTarget) =>
  paths.analysisJars.to({ ...t, only: only === 'all' ? undefined : only, from: period.from, to: period.to });

/** A number on an analysis screen that opens the jars behind it. */
export function JarsLink({ children, label, ...target }: JarsTarget & { children: ReactNode; label?: string }) {
  return (
    <Link
      to={jarsBehindPath(target)}
      className="text-inherit underline decoration-dotted underline-offset-2 hover:decoration-solid"
    >
      {children}
      {/* Spoken after the visible number, so voice control finds the link by what is on screen. */}
      {label && <span className="sr-only"> ({label})</span>}
    </Link>
  );
}
