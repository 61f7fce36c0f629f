import { defaultGaugeKPa } from '../../shared/schemas/cook-runs';
import { f0AtConstant } from '../../shared/stats/lethality';
import { sterilisingTemperatureC } from '../../shared/stats/steam';

export interface CookCycle {
  minutesAtPressure: number;
  gaugeKPa: number | null;
  altitudeM: number;
}

/** Saturated steam at the gauge reading plus the standard atmosphere at the site's altitude. */
export const cycleTemperatureC = (c: CookCycle): number =>
  sterilisingTemperatureC(c.gaugeKPa ?? defaultGaugeKPa, c.altitudeM);

/**
 * F0 if the whole hold were at chamber temperature. An upper bound: the centre of a jar of grain
 * lags the chamber, and heating-up and cooling-down are not counted.
 */
export const estimatedF0 = (c: CookCycle): number => f0AtConstant(cycleTemperatureC(c), c.minutesAtPressure);
