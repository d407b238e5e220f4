/** Escaping for text put into the explorer page: HTML text and attributes, and JSON inside a `<script>`. */

/**
 * Text safe in HTML element content and in double- or single-quoted attributes.
 * @example escapeHtml('<a & "b">') // '&lt;a &amp; &quot;b&quot;&gt;'
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/**
 * JSON that can sit inside `<script type="application/json">`: every `</` is written `<\/` and every `<!` is
 * written `\u003c!` (both read back as the same string), so no `</script>` or `<!--` can end or change the
 * element; the two JavaScript line separators are escaped too. Nothing else, so embedded SVG stays compact.
 * @example scriptJson({ t: '</script>' }) // '{"t":"<\\/script>"}'
 */
export function scriptJson(value: unknown): string {
  return JSON.stringify(value)
    .replaceAll('</', '<\\/')
    .replaceAll('<!', '\\u003c!')
    .replace(/[\u2028\u2029]/g, (c) => `\\u${c.charCodeAt(0).toString(16)}`);
}
