import { describe, it, expect } from 'vitest';
import { f0AtConstant } from '../../../shared/stats/lethality';
import {
  kPaToPsi,
  psiToKPa,
  saturationPressureMPa,
  saturationTemperatureK,
  standardAtmospherePressurePa,
  sterilisingTemperatureC,
} from '../../../shared/stats/steam';

describe('IAPWS-IF97 region 4', () => {
  // IAPWS R7-97(2012), verification values for equations 30 and 31, as listed in TRADE.md §3.
  // Each to the last digit the release quotes (9 significant digits).
  it('matches the release for the saturation pressure (eq. 30)', () => {
    expect(saturationPressureMPa(300)).toBeCloseTo(0.353658941e-2, 11);
    expect(saturationPressureMPa(500)).toBeCloseTo(2.63889776, 8);
  });

  it('matches the release for the saturation temperature (eq. 31)', () => {
    expect(saturationTemperatureK(0.1)).toBeCloseTo(372.755919, 6);
    expect(saturationTemperatureK(1)).toBeCloseTo(453.035632, 6);
    expect(saturationTemperatureK(10)).toBeCloseTo(584.149488, 6);
  });

  it('inverts one equation with the other', () => {
    for (const T of [300, 394.15, 500, 640]) expect(saturationTemperatureK(saturationPressureMPa(T))).toBeCloseTo(T, 7);
  });

  it('rejects states outside the saturation line', () => {
    expect(() => saturationPressureMPa(200)).toThrow(RangeError);
    expect(() => saturationTemperatureK(30)).toThrow(RangeError);
  });
});

describe('standardAtmospherePressurePa', () => {
  // ISO 2533:1975 / U.S. Standard Atmosphere 1976: 101 325 Pa at sea level, 89.87 kPa at 1 000 m.
  it('gives 101 325 Pa at sea level and 89.87 kPa at 1 000 m', () => {
    expect(standardAtmospherePressurePa(0)).toBe(101325);
    expect(standardAtmospherePressurePa(1000) / 1000).toBeCloseTo(89.87, 2);
  });

  it('rejects altitudes above the troposphere', () => {
    expect(() => standardAtmospherePressurePa(12000)).toThrow(RangeError);
  });
});

describe('pressure units', () => {
  // 1 psi = 6.894757293168 kPa (exact from 1 lb = 0.45359237 kg, g = 9.80665 m/s², 1 in = 25.4 mm).
  it('converts psi and kPa both ways', () => {
    expect(psiToKPa(1)).toBeCloseTo(6.894757293168, 12);
    expect(kPaToPsi(6.894757293168)).toBeCloseTo(1, 12);
    expect(kPaToPsi(psiToKPa(15))).toBeCloseTo(15, 12);
  });
});

describe('sterilisingTemperatureC', () => {
  // [COMP] in TRADE.md §3, from IAPWS-IF97 and ISO 2533.
  it('gives 120.95 °C at 15 psig and 115.20 °C at 10 psig at sea level', () => {
    expect(sterilisingTemperatureC(psiToKPa(15), 0)).toBeCloseTo(120.95, 2);
    expect(sterilisingTemperatureC(psiToKPa(10), 0)).toBeCloseTo(115.2, 2);
  });

  it('relates 121 °C to 205.04 kPa absolute, 103.71 kPa gauge, 15.04 psig', () => {
    const absoluteKPa = saturationPressureMPa(121 + 273.15) * 1000;
    expect(absoluteKPa).toBeCloseTo(205.04, 2);
    expect(absoluteKPa - 101.325).toBeCloseTo(103.71, 2);
    expect(kPaToPsi(absoluteKPa - 101.325)).toBeCloseTo(15.04, 2);
  });

  it('gives 118.3 °C at 15 psig at 1 500 m, so 90 min is F0 ≈ 47 instead of ≈ 87', () => {
    const high = sterilisingTemperatureC(psiToKPa(15), 1500);
    expect(high).toBeCloseTo(118.3, 1);
    expect(Math.round(f0AtConstant(high, 90))).toBe(47);
    expect(Math.round(f0AtConstant(sterilisingTemperatureC(psiToKPa(15), 0), 90))).toBe(87);
  });
});
