/**
 * Splits one CIF line into values: whitespace-separated, `'…'` and `"…"` quoted (a quote ends only before
 * whitespace or the line end), `#` starts a comment outside quotes. CIF 1.1 syntax (Hall, Allen & Brown 1991,
 * Acta Cryst. A47, 655). Returns null when the line opens a `;` text field, which this reader does not need.
 * @example cifTokens(`ATOM 1 C "C1'" . 1.0`) // ['ATOM', '1', 'C', "C1'", '.', '1.0']
 */
export function cifTokens(line: string): string[] | null {
  if (line.startsWith(';')) return null;
  const out: string[] = [];
  const n = line.length;
  let i = 0;
  while (i < n) {
    const c = line.charCodeAt(i);
    if (c === 32 || c === 9) {
      i++;
      continue;
    }
    const ch = line[i]!;
    if (ch === '#') break;
    if (ch === "'" || ch === '"') {
      let j = i + 1;
      while (j < n && !(line[j] === ch && (j + 1 === n || line[j + 1] === ' ' || line[j + 1] === '\t'))) j++;
      out.push(line.slice(i + 1, j));
      i = j + 1;
      continue;
    }
    let j = i;
    while (j < n && line[j] !== ' ' && line[j] !== '\t') j++;
    out.push(line.slice(i, j));
    i = j;
  }
  return out;
}
