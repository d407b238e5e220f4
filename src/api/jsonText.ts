/** JSON serialisation for every document conformark writes: numbers rounded once, here, never NaN. */

/**
 * Pretty JSON with non-integer numbers rounded to `digits` decimals and −0 written as 0. A non-finite number
 * is a bug upstream (analysis returns `null` for undefined values), so it throws rather than writing NaN.
 * @example jsonText({ a: 1 / 3 }) // '{\n  "a": 0.3333\n}\n'
 */
export function jsonText(value: unknown, digits = 4): string {
  const f = 10 ** digits;
  const text = JSON.stringify(
    value,
    (_key, v: unknown) => {
      if (typeof v !== 'number') return v;
      if (!Number.isFinite(v)) throw new Error(`non-finite number in JSON output: ${v}`);
      if (Number.isInteger(v)) return v;
      const r = Math.round(v * f) / f;
      return r === 0 ? 0 : r;
    },
    2,
  );
  return `${text}\n`;
}
