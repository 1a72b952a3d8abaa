/**
 * A small XML well-formedness check for the SVG the drawing code writes (Node has no DOM
 * parser, and no new package is added for tests): one root element, every tag closed in order,
 * attributes quoted, only the five predefined entities or numeric character references.
 */

/** Throws with the position of the first problem; returns the root element's name. */
export function assertWellFormedXml(xml: string): string {
  const text = xml.replace(/^<\?xml[^?]*\?>\s*/, '');
  const stack: string[] = [];
  let root: string | null = null;
  const tag = /<(\/?)([A-Za-z_][\w:.-]*)((?:\s+[A-Za-z_][\w:.-]*\s*=\s*(?:"[^"<]*"|'[^'<]*'))*)\s*(\/?)>|<!--[\s\S]*?-->|([^<]+)|(<)/g;
  let m: RegExpExecArray | null;
  while ((m = tag.exec(text)) !== null) {
    if (m[6]) throw new Error(`malformed tag at ${m.index}: ${text.slice(m.index, m.index + 40)}`);
    const content = m[5] ?? m[3] ?? '';
    for (const entity of content.match(/&[^;\s]*;?/g) ?? []) {
      if (!/^&(amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);$/.test(entity)) throw new Error(`bad entity ${entity} at ${m.index}`);
    }
    if (m[5] !== undefined) {
      if (stack.length === 0 && m[5].trim()) throw new Error(`text outside the root at ${m.index}`);
      continue;
    }
    if (m[0].startsWith('<!--')) continue;
    const [closing, name, , selfClosing] = [m[1], m[2]!, m[3], m[4]];
    if (closing) {
      const open = stack.pop();
      if (open !== name) throw new Error(`</${name}> closes <${open ?? 'nothing'}> at ${m.index}`);
      continue;
    }
    if (stack.length === 0) {
      if (root !== null) throw new Error(`second root element <${name}> at ${m.index}`);
      root = name;
    }
    if (!selfClosing) stack.push(name);
  }
  if (stack.length) throw new Error(`unclosed <${stack.join('>, <')}>`);
  if (root === null) throw new Error('no root element');
  return root;
}
