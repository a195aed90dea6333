/**
 * A small, safe XML reader for SVG import (geometry/ has no DOM). Elements, attributes,
 * text, comments, CDATA and processing instructions. Safety: a DOCTYPE is refused (so no
 * entity can be declared or expanded, and no external subset is fetched); only the five
 * predefined entities and numeric character references are decoded; input size, element
 * count and nesting depth are limited. Nothing is fetched or executed, ever.
 */

export interface XmlElement {
  readonly name: string;
  readonly attributes: Readonly<Record<string, string>>;
  readonly children: readonly XmlElement[];
  /** Concatenated text directly inside the element. */
  readonly text: string;
}

export class XmlError extends Error {
  override readonly name = 'XmlError';
}

export interface XmlLimits {
  readonly maxLength: number;
  readonly maxElements: number;
  readonly maxDepth: number;
}

export const XML_LIMITS: XmlLimits = { maxLength: 20_000_000, maxElements: 100_000, maxDepth: 200 };

const NAME = /^[A-Za-z_:][-A-Za-z0-9_.:]*/;

function lineCol(src: string, at: number): string {
  let line = 1;
  let last = 0;
  for (let i = 0; i < at && i < src.length; i++) if (src.charCodeAt(i) === 10) {
    line++;
    last = i + 1;
  }
  return `line ${line}, column ${at - last + 1}`;
}

function decode(s: string, src: string, at: number): string {
  return s.replace(/&(#x[0-9a-fA-F]+|#[0-9]+|[A-Za-z]+);?/g, (m, body: string) => {
    if (!m.endsWith(';')) throw new XmlError(`a bare "&" at ${lineCol(src, at)}`);
    if (body === 'lt') return '<';
    if (body === 'gt') return '>';
    if (body === 'amp') return '&';
    if (body === 'quot') return '"';
    if (body === 'apos') return "'";
    if (body.startsWith('#')) {
      const code = body[1] === 'x' ? parseInt(body.slice(2), 16) : parseInt(body.slice(1), 10);
      if (!(code > 0 && code <= 0x10ffff)) throw new XmlError(`bad character reference &${body}; at ${lineCol(src, at)}`);
      return String.fromCodePoint(code);
    }
    throw new XmlError(`entity &${body}; is not allowed (only the five predefined XML entities are) at ${lineCol(src, at)}`);
  });
}

interface Mutable {
  name: string;
  attributes: Record<string, string>;
  children: Mutable[];
  text: string;
}

/** Parse a document and return its root element. Throws XmlError with the position of the problem. */
export function xmlParse(src: string, limits: XmlLimits = XML_LIMITS): XmlElement {
  if (src.length > limits.maxLength) throw new XmlError(`the file is larger than ${limits.maxLength} characters`);
  let i = 0;
  let count = 0;
  const stack: Mutable[] = [];
  let root: Mutable | undefined;
  const n = src.length;
  if (src.charCodeAt(0) === 0xfeff) i = 1;
  while (i < n) {
    const lt = src.indexOf('<', i);
    const textEnd = lt < 0 ? n : lt;
    if (textEnd > i) {
      const text = src.slice(i, textEnd);
      if (stack.length > 0) stack[stack.length - 1]!.text += decode(text, src, i);
      else if (text.trim() !== '') throw new XmlError(`text outside the root element at ${lineCol(src, i)}`);
    }
    if (lt < 0) break;
    i = lt;
    if (src.startsWith('<!--', i)) {
      const end = src.indexOf('-->', i + 4);
      if (end < 0) throw new XmlError(`unclosed comment at ${lineCol(src, i)}`);
      i = end + 3;
      continue;
    }
    if (src.startsWith('<![CDATA[', i)) {
      const end = src.indexOf(']]>', i + 9);
      if (end < 0) throw new XmlError(`unclosed CDATA section at ${lineCol(src, i)}`);
      if (stack.length > 0) stack[stack.length - 1]!.text += src.slice(i + 9, end);
      i = end + 3;
      continue;
    }
    if (src.startsWith('<!', i)) throw new XmlError(`a DOCTYPE or other declaration is not allowed (entity declarations could expand without bound) at ${lineCol(src, i)}`);
    if (src.startsWith('<?', i)) {
      const end = src.indexOf('?>', i + 2);
      if (end < 0) throw new XmlError(`unclosed processing instruction at ${lineCol(src, i)}`);
      i = end + 2;
      continue;
    }
    if (src.startsWith('</', i)) {
      const m = NAME.exec(src.slice(i + 2, i + 202));
      if (!m) throw new XmlError(`bad closing tag at ${lineCol(src, i)}`);
      const open = stack.pop();
      if (!open || open.name !== m[0]) throw new XmlError(`closing tag </${m[0]}> does not match <${open?.name ?? 'nothing'}> at ${lineCol(src, i)}`);
      const gt = src.indexOf('>', i);
      if (gt < 0) throw new XmlError(`unclosed tag at ${lineCol(src, i)}`);
      i = gt + 1;
      continue;
    }
    // start tag
    const m = NAME.exec(src.slice(i + 1, i + 201));
    if (!m) throw new XmlError(`bad tag at ${lineCol(src, i)}`);
    // a prototype-less record: an attribute named __proto__ stays an ordinary key
    const el: Mutable = { name: m[0], attributes: Object.create(null) as Record<string, string>, children: [], text: '' };
    if (++count > limits.maxElements) throw new XmlError(`more than ${limits.maxElements} elements`);
    i += 1 + m[0].length;
    let selfClosing = false;
    for (;;) {
      while (i < n && /\s/.test(src[i]!)) i++;
      if (i >= n) throw new XmlError(`unclosed tag <${el.name}>`);
      if (src[i] === '>') {
        i++;
        break;
      }
      if (src.startsWith('/>', i)) {
        i += 2;
        selfClosing = true;
        break;
      }
      const an = NAME.exec(src.slice(i, i + 200));
      if (!an) throw new XmlError(`bad attribute in <${el.name}> at ${lineCol(src, i)}`);
      i += an[0].length;
      while (i < n && /\s/.test(src[i]!)) i++;
      if (src[i] !== '=') throw new XmlError(`attribute ${an[0]} of <${el.name}> has no value at ${lineCol(src, i)}`);
      i++;
      while (i < n && /\s/.test(src[i]!)) i++;
      const q = src[i];
      if (q !== '"' && q !== "'") throw new XmlError(`attribute ${an[0]} of <${el.name}> is not quoted at ${lineCol(src, i)}`);
      const end = src.indexOf(q, i + 1);
      if (end < 0) throw new XmlError(`unclosed attribute value at ${lineCol(src, i)}`);
      if (Object.hasOwn(el.attributes, an[0])) throw new XmlError(`attribute ${an[0]} repeated in <${el.name}> at ${lineCol(src, i)}`);
      el.attributes[an[0]] = decode(src.slice(i + 1, end), src, i);
      i = end + 1;
    }
    if (stack.length > 0) stack[stack.length - 1]!.children.push(el);
    else if (root) throw new XmlError(`a second root element <${el.name}> at ${lineCol(src, i)}`);
    else root = el;
    if (!selfClosing) {
      stack.push(el);
      if (stack.length > limits.maxDepth) throw new XmlError(`elements nested deeper than ${limits.maxDepth}`);
    }
  }
  if (stack.length > 0) throw new XmlError(`<${stack[stack.length - 1]!.name}> is never closed`);
  if (!root) throw new XmlError('the file has no root element');
  return root;
}
