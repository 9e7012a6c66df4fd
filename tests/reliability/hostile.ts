/** fast-check arbitraries for hostile request bodies: raw JSON text, including what JSON.stringify cannot make. */
import fc from 'fast-check';

/** A value that should upset a validator: wrong types, extremes, huge arrays, deep nesting, prototype keys. */
export const hostileValue: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e309', '-0', '5e-324', '9007199254740993', 'null', 'true', '""', '"12"', '"1e3"', '[]', '{}'),
  fc.string({ maxLength: 40 }).map((s) => JSON.stringify(s)),
  fc.integer({ min: 1000, max: 200_000 }).map((n) => JSON.stringify('x'.repeat(n))),
  fc.integer({ min: 1000, max: 100_000 }).map((n) => `[${Array(n).fill('1').join(',')}]`),
  fc.integer({ min: 50, max: 5000 }).map((d) => '['.repeat(d) + ']'.repeat(d)),
  fc.integer({ min: 50, max: 3000 }).map((d) => '{"a":'.repeat(d) + '1' + '}'.repeat(d)),
  fc.constantFrom('{"__proto__":{"polluted":1}}', '{"constructor":{"prototype":{"polluted":1}}}', '{"__proto__":null}', '{"toString":1,"valueOf":"x"}'),
  fc.jsonValue({ maxDepth: 3 }).map((v) => JSON.stringify(v)),
);

/** Replace the value at a random path of `valid` with a hostile value; returns JSON text. */
export function mutated(valid: unknown): fc.Arbitrary<string> {
  const paths: string[][] = [];
  const walk = (v: unknown, p: string[]) => {
    paths.push(p);
    if (v && typeof v === 'object' && p.length < 6) for (const [k, x] of Object.entries(v)) walk(x, [...p, k]);
  };
  walk(valid, []);
  const marker = '"\u0000HOSTILE\u0000"';
  return fc.tuple(fc.constantFrom(...paths), hostileValue, fc.boolean()).map(([path, value, extraKey]) => {
    const copy = JSON.parse(JSON.stringify(valid ?? {}));
    if (path.length === 0) return value;
    let at = copy;
    for (const k of path.slice(0, -1)) at = at[k];
    const last = path[path.length - 1];
    const hole = '\u0000HOSTILE\u0000';
    if (extraKey && !Array.isArray(at)) Object.defineProperty(at, '__proto__', { value: hole, enumerable: true, configurable: true, writable: true });
    else at[last] = hole;
    return JSON.stringify(copy).replace(marker, value);
  });
}

/** Broken JSON texts (body-parser must answer 400, never 500). */
export const brokenJson: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom('{', '{"a":}', '{"a":NaN}', "{'a':1}", '[1,2,', '\u0000', '{"a":1}}', '"unterminated'),
  fc.string({ maxLength: 30 }).filter((s) => { try { JSON.parse(s); return false; } catch { return true; } }),
);
