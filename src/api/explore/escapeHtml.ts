/** Escaping for text put into the explorer page: HTML text and attributes, and JSON inside a `<script>`. */

/**
 * Text safe in HTML element content and in double- or single-quoted attributes.
 * @example escapeHtml('<a & "b">') // '&lt;a &amp; &quot;b&quot;&gt;'
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/**
 * JSON that can sit inside `<script type="application/json">`: `<`, `>`, `&` and the two JavaScript line
 * separators are written as `\u` escapes, so no `</script>` or `<!--` can end or change the element.
 * @example scriptJson({ t: '</script>' }) // '{"t":"\\u003c/script\\u003e"}'
 */
export function scriptJson(value: unknown): string {
  return JSON.stringify(value).replace(/[<>&\u2028\u2029]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
