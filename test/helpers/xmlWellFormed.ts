/** A small XML well-formedness check for SVG output: balanced tags, quoted unique attributes, escaped text. */

/** Problems found in `xml` (empty when well-formed). */
export function xmlProblems(xml: string): string[] {
  const problems: string[] = [];
  const stack: string[] = [];
  let i = 0;
  let roots = 0;
  const text = (s: string) => {
    if (/[<>]/.test(s.replace(/&(amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);/g, ''))) problems.push(`raw < or > in text near ${i}`);
    if (/&(?!(amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);)/.test(s)) problems.push(`bare & near ${i}`);
    if (stack.length === 0 && s.trim() !== '') problems.push(`text outside the root near ${i}`);
  };
  while (i < xml.length) {
    const lt = xml.indexOf('<', i);
    if (lt < 0) {
      text(xml.slice(i));
      break;
    }
    text(xml.slice(i, lt));
    if (xml.startsWith('<!--', lt)) {
      const end = xml.indexOf('-->', lt);
      if (end < 0) return [...problems, 'unclosed comment'];
      i = end + 3;
      continue;
    }
    if (xml.startsWith('<?', lt)) {
      const end = xml.indexOf('?>', lt);
      if (end < 0) return [...problems, 'unclosed declaration'];
      i = end + 2;
      continue;
    }
    const gt = xml.indexOf('>', lt);
    if (gt < 0) return [...problems, `unclosed tag at ${lt}`];
    const tag = xml.slice(lt + 1, gt);
    i = gt + 1;
    if (tag.startsWith('/')) {
      const name = tag.slice(1).trim();
      const open = stack.pop();
      if (open !== name) problems.push(`</${name}> closes <${open ?? 'nothing'}>`);
      continue;
    }
    const selfClosing = tag.endsWith('/');
    const body = selfClosing ? tag.slice(0, -1) : tag;
    const m = /^([A-Za-z_][\w:.-]*)((?:\s+[A-Za-z_][\w:.-]*\s*=\s*(?:"[^"<]*"|'[^'<]*'))*)\s*$/.exec(body);
    if (!m) {
      problems.push(`malformed tag <${body.slice(0, 40)}>`);
      continue;
    }
    const names = [...m[2]!.matchAll(/([A-Za-z_][\w:.-]*)\s*=/g)].map((x) => x[1]!);
    if (new Set(names).size !== names.length) problems.push(`duplicate attribute in <${m[1]}>`);
    if (stack.length === 0) roots++;
    if (!selfClosing) stack.push(m[1]!);
  }
  if (stack.length > 0) problems.push(`unclosed <${stack.join('>, <')}>`);
  if (roots !== 1) problems.push(`${roots} root elements`);
  return problems;
}
