// A tiny well-formedness check for the SVG strings our figures produce (test helper): tags
// nest and close, attribute values are quoted, text holds no raw '<' or bare '&', and there
// is exactly one root element. It is not a full XML parser; it covers what our SVG uses.
export interface XmlElement {
  readonly name: string;
  readonly attrs: Readonly<Record<string, string>>;
}

export interface XmlReading {
  readonly elements: readonly XmlElement[];
  /** Text content of every element, in document order. */
  readonly texts: readonly string[];
}

const NAME = /^[A-Za-z_][\w:.-]*$/;

export function checkXml(xml: string): XmlReading {
  const stack: string[] = [];
  const elements: XmlElement[] = [];
  const texts: string[] = [];
  let roots = 0;
  let i = 0;
  while (i < xml.length) {
    const lt = xml.indexOf('<', i);
    const chunk = lt < 0 ? xml.slice(i) : xml.slice(i, lt);
    if (/&(?!(amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);)/.test(chunk)) throw new Error(`bare '&' in text near offset ${i}`);
    if (chunk.includes('>')) throw new Error(`raw '>' in text near offset ${i}`);
    if (chunk.trim() !== '') {
      if (stack.length === 0) throw new Error(`text outside the root element near offset ${i}`);
      texts.push(chunk.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&amp;/g, '&'));
    }
    if (lt < 0) break;
    const gt = xml.indexOf('>', lt);
    if (gt < 0) throw new Error(`unclosed tag at offset ${lt}`);
    const tag = xml.slice(lt + 1, gt);
    if (tag.includes('<')) throw new Error(`'<' inside a tag at offset ${lt}`);
    if (tag.startsWith('/')) {
      const name = tag.slice(1).trim();
      const open = stack.pop();
      if (open !== name) throw new Error(`closing </${name}> does not match <${open ?? 'nothing'}> at offset ${lt}`);
    } else {
      const selfClosing = tag.endsWith('/');
      const body = selfClosing ? tag.slice(0, -1) : tag;
      const m = /^([^\s/]+)([\s\S]*)$/.exec(body);
      if (!m || !NAME.test(m[1])) throw new Error(`bad element name in <${tag}> at offset ${lt}`);
      const attrs: Record<string, string> = {};
      let rest = m[2].trim();
      while (rest !== '') {
        const a = /^([A-Za-z_][\w:.-]*)\s*=\s*("([^"<]*)"|'([^'<]*)')\s*/.exec(rest);
        if (!a) throw new Error(`bad attribute '${rest.slice(0, 30)}' in <${m[1]}> at offset ${lt}`);
        if (a[1] in attrs) throw new Error(`attribute ${a[1]} twice in <${m[1]}>`);
        attrs[a[1]] = a[3] ?? a[4];
        rest = rest.slice(a[0].length);
      }
      if (stack.length === 0) roots++;
      elements.push({ name: m[1], attrs });
      if (!selfClosing) stack.push(m[1]);
    }
    i = gt + 1;
  }
  if (stack.length > 0) throw new Error(`unclosed elements: ${stack.join(' > ')}`);
  if (roots !== 1) throw new Error(`expected one root element, found ${roots}`);
  return { elements, texts };
}
