/**
 * A label broken at spaces into at most `maxLines` lines of about `width` characters, so a drawing shows it
 * whole; only a label that still does not fit is shortened, at the end of its last line (the full text goes in
 * a tooltip).
 */
export function wrapLabel(s: string, width: number, maxLines: number): string[] {
  const words = s.split(/\s+/).filter(Boolean);
  const out: string[] = [];
  let line = '';
  for (const w of words) {
    if (line && `${line} ${w}`.length > width) {
      out.push(line);
      line = w;
    } else line = line ? `${line} ${w}` : w;
  }
  if (line) out.push(line);
  if (out.length <= maxLines && out.every((l) => l.length <= width + 2)) return out;
  const kept = out.slice(0, maxLines);
  const last = out.slice(maxLines - 1).join(' ');
  kept[kept.length - 1] = last.length > width ? `${last.slice(0, width - 1).trimEnd()}…` : last;
  return kept.map((l) => (l.length > width + 2 ? `${l.slice(0, width - 1).trimEnd()}…` : l));
}
