export interface TemperatureSample {
  minute: number;
  celsius: number;
}

export interface F0Options {
  /**
   * rectangle: each sample's rate is held for the gap to the next sample, and the last sample for
   * the gap before it — the usual F0 = Δt·ΣL over every logged sample.
   * trapezoid: the rate is interpolated linearly between neighbouring samples.
   */
  method?: 'rectangle' | 'trapezoid';
  z?: number;
  tref?: number;
}

/** Lethal rate L = 10^((T − Tref)/z): minutes at Tref that one minute at T is worth. */
export function lethalRate(T: number, z = 10, Tref = 121.1): number {
  return 10 ** ((T - Tref) / z);
}

export function f0AtConstant(T: number, minutes: number, z = 10, Tref = 121.1): number {
  return lethalRate(T, z, Tref) * minutes;
}

/** F0 in minutes from a temperature log; fewer than two samples span no time and give 0. */
export function f0FromLog(samples: TemperatureSample[], opts: F0Options = {}): number {
  const { method = 'rectangle', z = 10, tref = 121.1 } = opts;
  for (let i = 1; i < samples.length; i++) {
    if (!((samples[i]?.minute ?? NaN) > (samples[i - 1]?.minute ?? NaN))) {
      throw new RangeError(`f0FromLog needs strictly increasing minutes (sample ${i})`);
    }
  }
  if (samples.length < 2) return 0;
  const rates = samples.map((s) => lethalRate(s.celsius, z, tref));
  const gaps = samples.slice(1).map((s, i) => s.minute - (samples[i]?.minute ?? 0));
  let f0 = 0;
  gaps.forEach((gap, i) => {
    const here = rates[i] ?? 0;
    const next = rates[i + 1] ?? 0;
    f0 += method === 'trapezoid' ? ((here + next) / 2) * gap : here * gap;
  });
  if (method === 'rectangle') f0 += (rates[rates.length - 1] ?? 0) * (gaps[gaps.length - 1] ?? 0);
  return f0;
}
