// Shared helpers for tests that read manifest.xml: a small typed element tree
// over fast-xml-parser's ordered output, and a PNG header reader.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { XMLParser, XMLValidator } from 'fast-xml-parser';

export const ROOT = fileURLToPath(new URL('../..', import.meta.url));
export const MANIFEST_PATH = join(ROOT, 'manifest.xml');
export const ORIGIN = 'https://localhost:3000';

export interface El {
  name: string;
  attrs: Record<string, string>;
  children: El[];
  text: string;
}

type RawNode = Record<string, unknown>;

function isRawNode(value: unknown): value is RawNode {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function toElements(nodes: unknown): El[] {
  if (!Array.isArray(nodes)) return [];
  const out: El[] = [];
  for (const node of nodes) {
    if (!isRawNode(node)) continue;
    const name = Object.keys(node).find((k) => k !== ':@');
    // Text, comments and the XML declaration are not elements.
    if (!name || name.startsWith('#') || name.startsWith('?')) continue;
    const rawAttrs = node[':@'];
    const attrs: Record<string, string> = {};
    if (isRawNode(rawAttrs)) for (const [k, v] of Object.entries(rawAttrs)) attrs[k] = String(v);
    const body = node[name];
    const text = Array.isArray(body)
      ? body
          .filter(isRawNode)
          .map((b) => (typeof b['#text'] === 'string' ? b['#text'] : ''))
          .join('')
      : '';
    out.push({ name, attrs, children: toElements(body), text });
  }
  return out;
}

export function wellFormed(xml: string): true | string {
  const result = XMLValidator.validate(xml);
  return result === true ? true : `${result.err.msg} (line ${result.err.line})`;
}

export function parseXml(xml: string): El {
  const parser = new XMLParser({
    preserveOrder: true,
    ignoreAttributes: false,
    attributeNamePrefix: '',
    parseTagValue: false,
    parseAttributeValue: false,
    trimValues: true,
  });
  const roots = toElements(parser.parse(xml));
  if (roots.length !== 1) throw new Error(`expected one root element, found ${roots.length}`);
  return roots[0];
}

export function loadManifest(): { xml: string; root: El } {
  const xml = readFileSync(MANIFEST_PATH, 'utf8');
  return { xml, root: parseXml(xml) };
}

/** Every descendant (not the element itself) named `name`, in document order. */
export function findAll(el: El, name: string): El[] {
  const found: El[] = [];
  for (const child of el.children) {
    if (child.name === name) found.push(child);
    found.push(...findAll(child, name));
  }
  return found;
}

export function child(el: El, name: string): El | undefined {
  return el.children.find((c) => c.name === name);
}

/** Follows a path of child names, failing loudly so a test names the missing step. */
export function path(el: El, ...names: string[]): El {
  let current = el;
  for (const name of names) {
    const next = child(current, name);
    if (!next) throw new Error(`<${current.name}> has no <${name}> child`);
    current = next;
  }
  return current;
}

export function allElements(el: El): El[] {
  return [el, ...el.children.flatMap(allElements)];
}

/** Resource id → DefaultValue for every bt:Image, bt:Url and bt:String. */
export function resources(root: El): Map<string, string> {
  const map = new Map<string, string>();
  for (const r of findAll(path(root, 'VersionOverrides', 'Resources'), 'bt:Image')
    .concat(findAll(path(root, 'VersionOverrides', 'Resources'), 'bt:Url'))
    .concat(findAll(path(root, 'VersionOverrides', 'Resources'), 'bt:String'))) {
    if (r.attrs.id !== undefined) map.set(r.attrs.id, r.attrs.DefaultValue ?? '');
  }
  return map;
}

/** Every absolute URL the host would fetch: attribute values and text, minus XML namespace names. */
export function urlsIn(root: El): string[] {
  const urls: string[] = [];
  for (const el of allElements(root)) {
    for (const [k, v] of Object.entries(el.attrs)) {
      if (k === 'xmlns' || k.startsWith('xmlns:')) continue;
      if (/^[a-z][a-z0-9+.-]*:\/\//i.test(v)) urls.push(v);
    }
    if (/^[a-z][a-z0-9+.-]*:\/\//i.test(el.text.trim())) urls.push(el.text.trim());
  }
  return urls;
}

export interface PngHeader {
  width: number;
  height: number;
}

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** Reads width and height from the IHDR chunk, which the PNG spec requires first. */
export function readPngHeader(bytes: Buffer): PngHeader {
  if (bytes.length < 24 || !bytes.subarray(0, 8).equals(PNG_SIGNATURE)) throw new Error('not a PNG file');
  if (bytes.toString('ascii', 12, 16) !== 'IHDR') throw new Error('PNG does not start with IHDR');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}
