// IAPWS R7-97(2012), IAPWS-IF97 region 4 (saturation line), equations 30 and 31.
const N = [
  0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.1202082470247e5, -0.32325550322333e7,
  0.1491510861353e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
] as const;
const [n1, n2, n3, n4, n5, n6, n7, n8, n9, n10] = N;

const T_TRIPLE_K = 273.15;
const T_CRITICAL_K = 647.096;
const P_MIN_MPA = 611.213e-6;
const P_CRITICAL_MPA = 22.064;

export const PA_PER_PSI = 6894.757293168;
export const KELVIN_OFFSET = 273.15;

/** Saturation pressure of water in MPa at TK kelvin (273.15 K to 647.096 K). */
export function saturationPressureMPa(TK: number): number {
  if (!(TK >= T_TRIPLE_K && TK <= T_CRITICAL_K))
    throw new RangeError(`saturationPressureMPa outside IF97 region 4: ${TK} K`);
  const theta = TK + n9 / (TK - n10);
  const A = theta * theta + n1 * theta + n2;
  const B = n3 * theta * theta + n4 * theta + n5;
  const C = n6 * theta * theta + n7 * theta + n8;
  return ((2 * C) / (-B + Math.sqrt(B * B - 4 * A * C))) ** 4;
}

/** Saturation temperature of water in K at pMPa (611.213 Pa to 22.064 MPa). */
export function saturationTemperatureK(pMPa: number): number {
  if (!(pMPa >= P_MIN_MPA && pMPa <= P_CRITICAL_MPA)) {
    throw new RangeError(`saturationTemperatureK outside IF97 region 4: ${pMPa} MPa`);
  }
  const beta = pMPa ** 0.25;
  const E = beta * beta + n3 * beta + n6;
  const F = n1 * beta * beta + n4 * beta + n7;
  const G = n2 * beta * beta + n5 * beta + n8;
  const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
  return (n10 + D - Math.sqrt((n10 + D) ** 2 - 4 * (n9 + n10 * D))) / 2;
}

/** ISO 2533 standard atmosphere, troposphere only (up to 11 000 m). */
export function standardAtmospherePressurePa(altitudeM: number): number {
  if (!(altitudeM >= -5000 && altitudeM <= 11000))
    throw new RangeError(`altitude outside the troposphere: ${altitudeM} m`);
  return 101325 * (1 - (0.0065 * altitudeM) / 288.15) ** 5.25588;
}

export function kPaToPsi(kPa: number): number {
  return (kPa * 1000) / PA_PER_PSI;
}

export function psiToKPa(psi: number): number {
  return (psi * PA_PER_PSI) / 1000;
}

/** Temperature of saturated steam in °C at a gauge pressure read at a site's altitude. */
export function sterilisingTemperatureC(gaugeKPa: number, altitudeM: number): number {
  const absoluteMPa = (gaugeKPa * 1000 + standardAtmospherePressurePa(altitudeM)) / 1e6;
  return saturationTemperatureK(absoluteMPa) - KELVIN_OFFSET;
}
