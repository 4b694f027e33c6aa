/**
 * A strict reader for the XML the JUnit report writes (XML 1.0: elements, attributes in double
 * quotes, character data, the five predefined entities and numeric references, one prolog).
 * It throws on anything not well-formed, so that a test can hold a renderer to the syntax.
 */
export interface XmlElement {
  name: string;
  attrs: Record<string, string>;
  children: XmlElement[];
  text: string;
}

const NAME = /^[A-Za-z_][\w.-]*/;
const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

function decode(raw: string, where: number): string {
  if (/[<]/.test(raw)) throw new Error(`"<" in character data at ${where}`);
  return raw.replace(/&([^;]*);|&/g, (_m, ref: string | undefined) => {
    if (ref === undefined) throw new Error(`a bare "&" at ${where}`);
    if (ref in ENTITIES) return ENTITIES[ref]!;
    const num = /^#(x[0-9A-Fa-f]+|\d+)$/.exec(ref);
    if (num === null) throw new Error(`an unknown entity &${ref}; at ${where}`);
    return String.fromCodePoint(num[1]!.startsWith('x') ? parseInt(num[1]!.slice(1), 16) : Number(num[1]));
  });
}

/** Parses a document with one root element; throws with the offset of the first fault. */
export function parseXml(text: string): XmlElement {
  // XML 1.0 §2.2: the characters a document may hold at all.
  const bad = /[^\t\n\r\u0020-\uD7FF\uE000-\uFFFD\u{10000}-\u{10FFFF}]/u.exec(text);
  if (bad !== null) throw new Error(`a character XML 1.0 does not allow at ${bad.index}`);
  let k = 0;
  const prolog = /^<\?xml version="1\.0" encoding="UTF-8"\?>\n?/.exec(text);
  if (prolog !== null) k = prolog[0].length;
  const stack: XmlElement[] = [];
  let root: XmlElement | undefined;
  while (k < text.length) {
    const lt = text.indexOf('<', k);
    const chunk = text.slice(k, lt < 0 ? text.length : lt);
    if (stack.length > 0) stack[stack.length - 1]!.text += decode(chunk, k);
    else if (chunk.trim() !== '') throw new Error(`text outside the root at ${k}`);
    if (lt < 0) break;
    if (text.startsWith('</', lt)) {
      const m = /^<\/([A-Za-z_][\w.-]*)\s*>/.exec(text.slice(lt));
      const open = stack.pop();
      if (m === null || open === undefined || m[1] !== open.name) throw new Error(`a mismatched end tag at ${lt}`);
      k = lt + m[0].length;
      continue;
    }
    const name = NAME.exec(text.slice(lt + 1));
    if (name === null) throw new Error(`a bad tag at ${lt}`);
    const el: XmlElement = { name: name[0], attrs: {}, children: [], text: '' };
    let j = lt + 1 + name[0].length;
    for (;;) {
      const attr = /^\s+([A-Za-z_][\w.:-]*)="([^"]*)"/.exec(text.slice(j));
      if (attr === null) break;
      if (attr[1]! in el.attrs) throw new Error(`attribute ${attr[1]} twice at ${j}`);
      el.attrs[attr[1]!] = decode(attr[2]!, j);
      j += attr[0].length;
    }
    const end = /^\s*(\/?)>/.exec(text.slice(j));
    if (end === null) throw new Error(`a bad tag at ${lt}`);
    k = j + end[0].length;
    if (stack.length > 0) stack[stack.length - 1]!.children.push(el);
    else if (root === undefined) root = el;
    else throw new Error(`a second root at ${lt}`);
    if (end[1] !== '/') stack.push(el);
  }
  if (stack.length > 0 || root === undefined) throw new Error('unclosed elements or no root');
  return root;
}
