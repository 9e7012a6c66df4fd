/**
 * A small SPICE netlist reader for the tests (independent of the writer): title line, "*" comments,
 * "+" continuations, dot-commands skipped until .end; elements R, C, I, V, E, F, G, H with plain
 * numbers or the usual scale suffixes (f p n u m k meg g t; SPICE3 conventions, from memory).
 */

/** One element: its kind (first letter), name, nodes, controlling source (F, H) and value. */
export interface Element {
  kind: 'R' | 'C' | 'I' | 'V' | 'E' | 'F' | 'G' | 'H';
  name: string;
  nodes: string[];
  control?: string;
  value: number;
}

const suffixes: [RegExp, number][] = [[/meg$/, 1e6], [/f$/, 1e-15], [/p$/, 1e-12], [/n$/, 1e-9], [/u$/, 1e-6], [/m$/, 1e-3], [/k$/, 1e3], [/g$/, 1e9], [/t$/, 1e12]];

/** A SPICE number: plain or with a scale suffix (case-insensitive). */
export function spiceValue(token: string): number {
  const t = token.toLowerCase();
  const plain = Number(t);
  if (Number.isFinite(plain)) return plain;
  for (const [re, scale] of suffixes) {
    if (re.test(t)) {
      const x = Number(t.replace(re, ''));
      if (Number.isFinite(x)) return x * scale;
    }
  }
  throw new Error(`not a SPICE number: ${token}`);
}

/** Read a netlist's elements (names and nodes folded to lower case, as SPICE does). */
export function readNetlist(text: string): Element[] {
  const raw = text.split(/\r?\n/).slice(1);
  const joined: string[] = [];
  for (const line of raw) {
    if (line.startsWith('+') && joined.length) joined[joined.length - 1] += ' ' + line.slice(1);
    else joined.push(line);
  }
  const out: Element[] = [];
  for (const line of joined) {
    const t = line.trim().toLowerCase();
    if (!t || t.startsWith('*')) continue;
    if (t.startsWith('.')) {
      if (t.startsWith('.end') && !t.startsWith('.ends')) break;
      continue;
    }
    const tokens = t.split(/\s+/);
    const kind = tokens[0][0].toUpperCase() as Element['kind'];
    const name = tokens[0];
    const withoutDc = tokens.filter((x, i) => !(i >= 3 && x === 'dc'));
    switch (kind) {
      case 'R': case 'C': case 'I': case 'V':
        out.push({ kind, name, nodes: withoutDc.slice(1, 3), value: spiceValue(withoutDc[3]) });
        break;
      case 'E': case 'G':
        out.push({ kind, name, nodes: tokens.slice(1, 5), value: spiceValue(tokens[5]) });
        break;
      case 'F': case 'H':
        out.push({ kind, name, nodes: tokens.slice(1, 3), control: tokens[3], value: spiceValue(tokens[4]) });
        break;
      default:
        throw new Error(`element kind not supported by the test reader: ${name}`);
    }
  }
  return out;
}
