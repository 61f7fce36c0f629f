// Malformed requests for npm run fuzz: every route, with bad types, sizes, prototype names,
// encodings, dates, numbers and multipart garbage, drawn from a seeded generator so a run repeats.

import { routes, type Probe } from './fuzz-routes';
import {
  badDates,
  badIds,
  badNumbers,
  bodyKeys,
  encode,
  prng,
  prototypeNames,
  queryKeys,
  weirdStrings,
} from './fuzz-values';

export function malformedRequests(count: number, seed: number): Probe[] {
  const rnd = prng(seed);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rnd() * xs.length)]!;
  const badValue = (): unknown =>
    pick<() => unknown>([
      () => pick(weirdStrings),
      () => pick(badDates),
      () => pick(badNumbers),
      () => Number(pick(['-1', '0', '1e308', '4294967296', '-2147483649'])),
      () => true,
      () => null,
      () => [],
      () => [pick(weirdStrings), 1, null],
      () => ({ [pick(prototypeNames)]: { polluted: true } }),
      () => pick(prototypeNames),
    ])();
  const jsonBody = () => {
    const fields = Array.from(
      { length: 1 + Math.floor(rnd() * 4) },
      () => `"${pick([...bodyKeys, ...prototypeNames])}":${JSON.stringify(badValue()) ?? 'null'}`,
    );
    return `{${fields.join(',')}}`;
  };
  const bodies: [string, () => { body: Uint8Array | string; type: string }][] = [
    ['json of wrong types', () => ({ body: jsonBody(), type: 'application/json' })],
    [
      'json with huge numbers',
      () => ({
        body: `{"count":1e400,"minutesAtPressure":-1e400,"version":${'9'.repeat(300)}}`,
        type: 'application/json',
      }),
    ],
    [
      'json with __proto__',
      () => ({ body: '{"__proto__":{"admin":true},"constructor":{"prototype":{"x":1}}}', type: 'application/json' }),
    ],
    ['truncated json', () => ({ body: '{"username": "a', type: 'application/json' })],
    ['json array', () => ({ body: '[1,2,3]', type: 'application/json' })],
    ['json scalar', () => ({ body: pick(['null', '"text"', '42', 'true']), type: 'application/json' })],
    [
      'invalid utf-8',
      () => ({
        body: new Uint8Array([0x7b, 0x22, 0x61, 0x22, 0x3a, 0x22, 0xc3, 0x28, 0xff, 0xfe, 0x22, 0x7d]),
        type: 'application/json; charset=utf-8',
      }),
    ],
    ['utf-16 declared', () => ({ body: '{"a":1}', type: 'application/json; charset=utf-16' })],
    ['deep nesting', () => ({ body: `${'['.repeat(5000)}${']'.repeat(5000)}`, type: 'application/json' })],
    ['body over 1 MB', () => ({ body: `{"notes":"${'x'.repeat(1_100_000)}"}`, type: 'application/json' })],
    [
      'form encoded',
      () => ({ body: 'username[$gt]=&password[]=1&__proto__[x]=1', type: 'application/x-www-form-urlencoded' }),
    ],
    [
      'csv garbage',
      () => ({ body: `minute,celsius\n${pick(badNumbers)},${pick(badNumbers)}\n"unclosed,1\n`, type: 'text/csv' }),
    ],
    [
      'csv history garbage',
      () => ({
        body: `jar_label,grain,cook_run,cook_minutes,inoculated_on,session,operator,culture,outcome,contaminant,found_on\nJ1,rye,C1,${pick(badNumbers)},${pick(badDates)},S1,op,L1,${pick(['clean', 'maybe', ''])},${pick(prototypeNames)},${pick(badDates)}\n`,
        type: 'text/csv',
      }),
    ],
    [
      'multipart garbage',
      () => ({
        body: '--x\r\nContent-Disposition: form-data; name="photos"; filename="a.jpg"\r\n\r\n\xff\xd8garbage',
        type: 'multipart/form-data; boundary=x',
      }),
    ],
    ['multipart no boundary', () => ({ body: 'whatever', type: 'multipart/form-data' })],
    ['multipart bomb header', () => ({ body: multipartPng(), type: 'multipart/form-data; boundary=b0undary' })],
    ['wrong content type', () => ({ body: '<xml/>', type: 'application/xml' })],
  ];
  const query = () => {
    const params = Array.from({ length: 1 + Math.floor(rnd() * 3) }, () => {
      const key = pick(queryKeys);
      const value = pick<() => string>([
        () => pick(prototypeNames),
        () => `-${pick(prototypeNames)}`,
        () => pick(badDates),
        () => pick(badNumbers),
        () => pick(weirdStrings),
      ])();
      return pick([
        `${key}=${encode(value)}`,
        `${key}[]=${encode(value)}`,
        `${key}[${pick(prototypeNames)}]=1`,
        `${key}=%E0%A4%A`,
      ]);
    });
    return `?${params.join('&')}`;
  };
  const probes: Probe[] = [];
  for (let i = 0; i < count; i += 1) {
    const [method, template] = routes[i % routes.length]!;
    // Signing out would leave the rest of the run anonymous: logout is probed without a session.
    const as = template.endsWith('/logout')
      ? 'anonymous'
      : pick(['anonymous', 'technician', 'supervisor', 'trainer', 'admin', 'admin', 'supervisor'] as const);
    const id = rnd() < 0.3 ? String(1 + Math.floor(rnd() * 5)) : pick(badIds);
    const path = template
      .replace(':id', id)
      .replace(':label', encode(pick([...weirdStrings, ...prototypeNames]).slice(0, 300)) || 'x');
    if (method === 'GET' || method === 'DELETE' || rnd() < 0.1) {
      probes.push({ method, path: path + query(), headers: {}, as, what: 'query' });
      continue;
    }
    const [what, make] = pick(bodies);
    const { body, type } = make();
    probes.push({ method, path, headers: { 'content-type': type }, body, as, badToken: rnd() < 0.05, what });
  }
  return probes;
}

/** A multipart photo whose PNG header claims 50000 × 50000 pixels. */
function multipartPng(): Uint8Array {
  const header = Buffer.from('89504e470d0a1a0a0000000d49484452' + '0000c350' + '0000c350' + '0806000000', 'hex');
  return Buffer.concat([
    Buffer.from(
      '--b0undary\r\nContent-Disposition: form-data; name="photos"; filename="bomb.png"\r\nContent-Type: image/png\r\n\r\n',
    ),
    header,
    Buffer.from('\r\n--b0undary--\r\n'),
  ]);
}
