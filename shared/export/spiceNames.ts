/** SPICE-safe text: node/element names (case-insensitive, [a-z0-9_]) and ASCII comment lines. */

/** Node name stems, one per label: lower case, other characters as "_", unique after SPICE's case folding. */
export function spiceStems(labels: string[]): string[] {
  const taken = new Set<string>();
  return labels.map((label) => {
    const base = label.toLowerCase().replace(/\/tier\s*/g, '_t').replace(/[^a-z0-9_]+/g, '_').replace(/^_+|_+$/g, '') || 'node';
    let stem = base;
    for (let k = 2; taken.has(stem); k++) stem = `${base}_${k}`;
    taken.add(stem);
    return stem;
  });
}

/** Text made safe for a SPICE comment: ASCII only, one line. */
export function asciiText(text: string): string {
  return text
    .replace(/°C/g, 'degC')
    .replace(/[·×]/g, '*')
    .replace(/[–—]/g, '-')
    .replace(/τ/g, 'tau')
    .replace(/[\r\n]+/g, ' ')
    .replace(/[^\x20-\x7e]/g, '?');
}

/** Comment lines ("* …") wrapping `text` at about `width` characters. */
export function commentBlock(text: string, width = 96, prefix = '* '): string[] {
  const words = asciiText(text).split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = '';
  for (const w of words) {
    if (line && line.length + 1 + w.length > width) {
      lines.push(prefix + line);
      line = w;
    } else line = line ? `${line} ${w}` : w;
  }
  if (line) lines.push(prefix + line);
  return lines;
}

/** A number as SPICE reads it: the shortest exact decimal form (no unit suffixes). */
export function spiceNumber(x: number): string {
  if (!Number.isFinite(x)) throw new RangeError(`Cannot write ${x} into a netlist.`);
  return String(x);
}
