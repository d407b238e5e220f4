/**
 * Text from input files made safe to show: characters that are invalid in XML or that can disguise text
 * (C0/C1 controls, DEL, bidirectional overrides and isolates, lone surrogates, non-characters) become U+FFFD,
 * line breaks and tabs become spaces, and anything longer than `maxLength` characters is cut with an ellipsis.
 * Markup characters (`<`, `&`, quotes) are left alone: the SVG serialiser escapes them.
 */
import type { Warning } from '../../model/errors.js';
import type { Scene } from '../scene.js';

/** Longest label (atom name, title, SD field value) drawn in a figure, characters. */
export const MAX_LABEL_LENGTH = 200;

// C0 except tab/LF/CR (handled as spaces), DEL, C1, bidi marks/embeddings/overrides/isolates, BOM, non-characters
const UNSAFE = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069\ufeff\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;
const BREAKS = /[\t\n\r\u2028\u2029]/g;

/** What {@link safeText} made of a text. */
export interface SafeText {
  readonly text: string;
  /** The text was longer than the limit and was cut. */
  readonly truncated: boolean;
  /** Unsafe characters were replaced. */
  readonly replaced: boolean;
}

/**
 * The displayable form of `text`: unsafe characters replaced by U+FFFD, breaks by spaces, at most
 * `maxLength` characters (code points; default {@link MAX_LABEL_LENGTH}) ending in `…` when cut.
 * @example safeText('a\u202eb').text // 'a\ufffdb'
 */
export function safeText(text: string, maxLength = MAX_LABEL_LENGTH): SafeText {
  const cleaned = text.replace(BREAKS, ' ').replace(UNSAFE, '\ufffd');
  const replaced = cleaned !== text.replace(BREAKS, ' ');
  if (cleaned.length <= maxLength) return { text: cleaned, truncated: false, replaced };
  const points = Array.from(cleaned);
  if (points.length <= maxLength) return { text: cleaned, truncated: false, replaced };
  return { text: `${points.slice(0, Math.max(0, maxLength - 1)).join('')}…`, truncated: true, replaced };
}

/**
 * Warnings for the texts of a scene (title, description, labels) that `renderSvg` will cut or clean, so a
 * command can say so instead of changing the figure silently.
 * @example sceneTextWarnings(scene) // [{ code: 'long-label', message: "label 'Lorem…' ..." }]
 */
export function sceneTextWarnings(scene: Scene): Warning[] {
  const out: Warning[] = [];
  const texts = [scene.title, scene.desc, ...scene.items.flatMap((item) => (item.type === 'text' ? [item.text] : []))];
  let replaced = false;
  for (const text of texts) {
    const safe = safeText(text);
    if (safe.truncated && !out.some((w) => w.message.includes(safe.text.slice(0, 30)))) {
      const head = safeText(text, 30).text;
      out.push({ code: 'long-label', message: `the text '${head}' is longer than ${MAX_LABEL_LENGTH} characters; the figure shows it cut short` });
    }
    replaced ||= safe.replaced;
  }
  if (replaced) out.push({ code: 'unsafe-text', message: 'control or text-direction characters in the input were replaced by \ufffd in the figure' });
  return out;
}
