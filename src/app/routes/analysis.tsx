import { useQuery } from '@tanstack/react-query';
import { CausesScreen } from '../../features/analysis/components/causes-screen';
import { ColonisationScreen } from '../../features/analysis/components/colonisation-screen';
import { CrosstabScreen } from '../../features/analysis/components/crosstab-screen';
import { JarsBehindScreen } from '../../features/analysis/components/jars-behind-screen';
import { LethalityScreen } from '../../features/analysis/components/lethality-screen';
import { RatesScreen } from '../../features/analysis/components/rates-screen';
import { WeeklyScreen } from '../../features/analysis/components/weekly-screen';
import { ActionVerdictsScreen } from '../../features/analysis/components/action-verdicts-screen';
import { settingsQueries } from '../../features/settings/api/settings-queries';

export function AnalysisWeeklyRoute() {
  return (
    <>
      <title>Weekly table · Asepta</title>
      <WeeklyScreen />
    </>
  );
}

export function AnalysisCausesRoute() {
  const settings = useQuery(settingsQueries.detail());
  return (
    <>
      <title>Likely causes · Asepta</title>
      <CausesScreen windowDays={settings.data?.observationWindowDays} />
    </>
  );
}

export function AnalysisRatesRoute() {
  return (
    <>
      <title>Contamination rates · Asepta</title>
      <RatesScreen />
    </>
  );
}

export function AnalysisCrosstabRoute() {
  return (
    <>
      <title>Cross-table · Asepta</title>
      <CrosstabScreen />
    </>
  );
}

export function AnalysisColonisationRoute() {
  return (
    <>
      <title>Colonisation time · Asepta</title>
      <ColonisationScreen />
    </>
  );
}

export function AnalysisLethalityRoute() {
  return (
    <>
      <title>Cook lethality · Asepta</title>
      <LethalityScreen />
    </>
  );
}

export function AnalysisJarsRoute() {
  return (
    <>
      <title>Jars behind a number · Asepta</title>
      <JarsBehindScreen />
    </>
  );
}

export function AnalysisActionsRoute() {
  return (
    <>
      <title>Did it work? · Asepta</title>
      <ActionVerdictsScreen />
    </>
  );
}
