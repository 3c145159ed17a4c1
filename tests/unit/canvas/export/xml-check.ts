/**
 * A small strict XML well-formedness check for the tests (Node has no DOMParser): one root element, every tag
 * closed in order, attributes quoted and not repeated, only the five predefined entities or character references,
 * no stray "<" or "&" in text. Rules from the XML 1.0 recommendation (W3C, fifth edition), §2.1–2.8 and §4.1.
 * Answers the element tree it read, so tests can look into it.
 */
export interface XmlElement {
  name: string;
  attributes: Record<string, string>;
  children: XmlElement[];
  text: string;
}

const NAME = /^[A-Za-z_:][\w.:-]*$/;
const REFERENCE = /&(?:amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);/g;

function checkText(text: string, where: string): string {
  if (text.includes("<")) throw new Error(`a raw "<" in ${where}`);
  const stray = text.replace(REFERENCE, "");
  if (stray.includes("&")) throw new Error(`an "&" that is not a reference in ${where}`);
  return text.replace(REFERENCE, (ref) => ({ "&amp;": "&", "&lt;": "<", "&gt;": ">", "&quot;": '"', "&apos;": "'" })[ref] ?? String.fromCodePoint(ref[2] === "x" ? parseInt(ref.slice(3, -1), 16) : Number(ref.slice(2, -1))));
}

function parseAttributes(source: string, tag: string): Record<string, string> {
  const attributes: Record<string, string> = {};
  let rest = source.trim();
  while (rest.length > 0) {
    const match = /^([^\s=]+)\s*=\s*("([^"]*)"|'([^']*)')\s*/.exec(rest);
    if (!match) throw new Error(`a malformed attribute in <${tag}>: ${rest.slice(0, 40)}`);
    const [whole, name, , double, single] = match;
    if (!NAME.test(name)) throw new Error(`a bad attribute name ${name} in <${tag}>`);
    if (name in attributes) throw new Error(`attribute ${name} repeated in <${tag}>`);
    attributes[name] = checkText(double ?? single, `attribute ${name} of <${tag}>`);
    rest = rest.slice(whole.length);
  }
  return attributes;
}

export function parseXml(source: string): XmlElement {
  let text = source.replace(/^<\?xml[^?]*\?>\s*/, "");
  const stack: XmlElement[] = [];
  let root: XmlElement | null = null;
  while (text.length > 0) {
    const open = text.indexOf("<");
    const chunk = open === -1 ? text : text.slice(0, open);
    if (chunk.trim().length > 0) {
      if (stack.length === 0) throw new Error(`text outside the root element: ${chunk.slice(0, 40)}`);
      stack[stack.length - 1].text += checkText(chunk, `<${stack[stack.length - 1].name}>`);
    }
    if (open === -1) break;
    const close = text.indexOf(">", open);
    if (close === -1) throw new Error("a tag that never closes");
    const tag = text.slice(open + 1, close);
    text = text.slice(close + 1);
    if (tag.startsWith("/")) {
      const name = tag.slice(1).trim();
      const top = stack.pop();
      if (!top || top.name !== name) throw new Error(`</${name}> closes <${top?.name ?? "nothing"}>`);
      continue;
    }
    const selfClosing = tag.endsWith("/");
    const body = selfClosing ? tag.slice(0, -1) : tag;
    const name = /^\S+/.exec(body)?.[0] ?? "";
    if (!NAME.test(name)) throw new Error(`a bad element name "${name}"`);
    const element: XmlElement = { name, attributes: parseAttributes(body.slice(name.length), name), children: [], text: "" };
    if (stack.length === 0) {
      if (root) throw new Error("more than one root element");
      root = element;
    } else stack[stack.length - 1].children.push(element);
    if (!selfClosing) stack.push(element);
  }
  if (stack.length > 0) throw new Error(`<${stack[stack.length - 1].name}> is never closed`);
  if (!root) throw new Error("no root element");
  return root;
}

export function descendants(element: XmlElement): XmlElement[] {
  return element.children.flatMap((child) => [child, ...descendants(child)]);
}
