/** Break a part name into at most `maxLines` lines of `width` characters at spaces, ending with "…" when cut. */
export function wrapName(name: string, width: number, maxLines = 2): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of name.split(/\s+/).filter(Boolean)) {
    const next = line ? `${line} ${word}` : word;
    if (next.length <= width || !line) line = next;
    else {
      lines.push(line);
      line = word;
    }
  }
  if (line) lines.push(line);
  const cut = lines.length > maxLines;
  const out = lines.slice(0, maxLines).map((l) => (l.length > width ? `${l.slice(0, width - 1)}…` : l));
  if (cut) {
    const last = out[maxLines - 1];
    out[maxLines - 1] = last.length >= width ? `${last.slice(0, width - 1)}…` : `${last}…`;
  }
  return out;
}
