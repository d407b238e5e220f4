/**
 * The XYZ comment line as extended-XYZ style `key=value` pairs: values may be double-quoted (`"a b"`, with
 * `\"` and `\\` escapes); words without `=` are part of the title only.
 */

const EMPTY: Readonly<Record<string, string>> = Object.freeze({});

/**
 * Reads the `key=value` pairs of a comment line, in order; the last of a repeated key wins.
 * @example parseXyzComment('frame 3 energy=-12.5 kcal note="a b"') // { energy: '-12.5', note: 'a b' }
 */
export function parseXyzComment(line: string): Readonly<Record<string, string>> {
  if (line.indexOf('=') === -1) return EMPTY;
  const out: Record<string, string> = {};
  let i = 0;
  const n = line.length;
  while (i < n) {
    while (i < n && (line[i] === ' ' || line[i] === '\t')) i++;
    if (i >= n) break;
    const [key, afterKey] = readWord(line, i, true);
    if (line[afterKey] === '=' && key !== '') {
      const [value, next] = readWord(line, afterKey + 1, false);
      out[key] = value;
      i = next;
    } else {
      i = afterKey === i ? i + 1 : afterKey;
    }
  }
  return out;
}

/** Reads a bare or quoted word starting at `i`; a key stops at `=`. Returns the text and the index after it. */
function readWord(line: string, i: number, isKey: boolean): [string, number] {
  const n = line.length;
  if (line[i] === '"') {
    let text = '';
    let j = i + 1;
    while (j < n && line[j] !== '"') {
      if (line[j] === '\\' && j + 1 < n) j++;
      text += line[j];
      j++;
    }
    return [text, Math.min(j + 1, n)];
  }
  let j = i;
  while (j < n && line[j] !== ' ' && line[j] !== '\t' && !(isKey && line[j] === '=')) j++;
  return [line.slice(i, j), j];
}

/** Writes one `key=value` pair, quoting the value (or key) when it has blanks, quotes, `=` or is empty. */
export function formatXyzPair(key: string, value: string): string {
  return `${quoteIfNeeded(key)}=${quoteIfNeeded(value)}`;
}

function quoteIfNeeded(text: string): string {
  const flat = text.replace(/\r?\n/g, ' ');
  if (flat !== '' && !/[\s"=\\]/.test(flat)) return flat;
  return `"${flat.replace(/[\\"]/g, (c) => `\\${c}`)}"`;
}
