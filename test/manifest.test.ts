import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { manifestVersion } from '../scripts/build/deployTarget';
import { compareVersions, requirementSetsUsed } from './support/apiSets';
import { type El, ORIGIN, ROOT, allElements, child, findAll, loadManifest, path, readPngHeader, resources, urlsIn, wellFormed } from './support/manifest';

// Features that functions.json options switch on, with the set their Invocation member belongs to
// (CustomFunctions.Invocation reference: parameterAddresses is [Api set: CustomFunctionsRuntime 1.3]).
// allowErrorForDataTypeAny has no documented set, so it adds none.
const METADATA_OPTION_SETS: Record<string, { set: string; version: string }> = {
  requiresAddress: { set: 'CustomFunctionsRuntime', version: '1.1' },
  requiresParameterAddresses: { set: 'CustomFunctionsRuntime', version: '1.3' },
};

interface MetadataGenerator {
  generateCustomFunctionsMetadata(input: string, wantConsoleOutput?: boolean): Promise<{ metadataJson: string; errors: string[] }>;
}

/** The functions.json options the JSDoc turns on, generated as the build does. */
async function metadataOptionsUsed(): Promise<Set<string>> {
  // The generator is the metadata plugin's own dependency, so it is resolved from there.
  const fromPlugin = createRequire(createRequire(import.meta.url).resolve('custom-functions-metadata-plugin'));
  const generator = fromPlugin('custom-functions-metadata') as MetadataGenerator;
  const result = await generator.generateCustomFunctionsMetadata(join(ROOT, 'src/functions/functions.ts'));
  expect(result.errors).toEqual([]);
  const parsed: unknown = JSON.parse(result.metadataJson);
  const functions = typeof parsed === 'object' && parsed !== null && 'functions' in parsed && Array.isArray(parsed.functions) ? parsed.functions : [];
  const options = new Set<string>();
  for (const fn of functions as { options?: Record<string, unknown> }[]) {
    for (const [name, value] of Object.entries(fn.options ?? {})) if (value === true) options.add(name);
  }
  return options;
}

const GUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const ICON_SIZES = [16, 32, 64, 80];

let xml: string;
let root: El;
let host: El;
let res: Map<string, string>;

beforeAll(() => {
  ({ xml, root } = loadManifest());
  host = path(root, 'VersionOverrides', 'Hosts', 'Host');
  res = resources(root);
});

function residOf(el: El): string {
  const id = el.attrs.resid;
  if (id === undefined) throw new Error(`<${el.name}> has no resid`);
  return id;
}

function customFunctionsPoint(): El {
  const points = findAll(path(host, 'AllFormFactors'), 'ExtensionPoint').filter((e) => e.attrs['xsi:type'] === 'CustomFunctions');
  expect(points).toHaveLength(1);
  return points[0];
}

function showTaskpaneActions(): El[] {
  return findAll(host, 'Action').filter((a) => a.attrs['xsi:type'] === 'ShowTaskpane');
}

describe('manifest.xml', () => {
  it('is well-formed XML with a task pane OfficeApp root', () => {
    expect(wellFormed(xml)).toBe(true);
    expect(root.name).toBe('OfficeApp');
    expect(root.attrs['xsi:type']).toBe('TaskPaneApp');
    expect(path(root, 'VersionOverrides').attrs['xsi:type']).toBe('VersionOverridesV1_0');
  });

  it('targets Excel workbooks', () => {
    expect(findAll(path(root, 'Hosts'), 'Host').map((h) => h.attrs.Name)).toEqual(['Workbook']);
    expect(host.attrs['xsi:type']).toBe('Workbook');
  });

  it('has a GUID Id and our provider name', () => {
    expect(path(root, 'Id').text).toMatch(GUID);
    expect(path(root, 'ProviderName').text).toBe('Plumbline');
  });

  it('declares exactly one long-lived runtime, first inside Host', () => {
    const runtimes = findAll(root, 'Runtimes');
    expect(runtimes).toHaveLength(1);
    const list = runtimes[0].children.filter((c) => c.name === 'Runtime');
    expect(list).toHaveLength(1);
    expect(list[0].attrs.lifetime).toBe('long');
    // The documented shape puts Runtimes directly after the Host start tag.
    expect(host.children[0]?.name).toBe('Runtimes');
  });

  it('points the runtime, functions page, FunctionFile and every ShowTaskpane at one resource', () => {
    const runtime = residOf(path(host, 'Runtimes', 'Runtime'));
    const page = residOf(path(customFunctionsPoint(), 'Page', 'SourceLocation'));
    const functionFile = residOf(path(host, 'DesktopFormFactor', 'FunctionFile'));
    const actions = showTaskpaneActions();
    expect(actions.length).toBeGreaterThan(0);
    const panes = actions.map((a) => residOf(path(a, 'SourceLocation')));
    expect(new Set([runtime, page, functionFile, ...panes])).toEqual(new Set([runtime]));
    expect(res.get(runtime)).toBe(`${ORIGIN}/taskpane.html`);
  });

  it('loads the functions script and metadata the build emits', () => {
    const point = customFunctionsPoint();
    expect(res.get(residOf(path(point, 'Script', 'SourceLocation')))).toBe(`${ORIGIN}/functions.js`);
    expect(res.get(residOf(path(point, 'Metadata', 'SourceLocation')))).toBe(`${ORIGIN}/functions.json`);
  });

  it('puts the functions in the PLUMB namespace', () => {
    const ns = residOf(path(customFunctionsPoint(), 'Namespace'));
    expect(res.get(ns)).toBe('PLUMB');
  });

  it('asks for ReadWriteDocument permission', () => {
    expect(path(root, 'Permissions').text).toBe('ReadWriteDocument');
  });

  it("places the OfficeApp children in the schema's order", () => {
    // "How to find the proper order of manifest elements", Basic task pane add-in element ordering:
    // Office rejects a manifest whose elements are out of this order.
    const SCHEMA_ORDER = [
      'Id',
      'AlternateId',
      'Version',
      'ProviderName',
      'DefaultLocale',
      'DisplayName',
      'Description',
      'IconUrl',
      'HighResolutionIconUrl',
      'SupportUrl',
      'AppDomains',
      'Hosts',
      'Requirements',
      'DefaultSettings',
      'Permissions',
      'Dictionary',
      'VersionOverrides',
      'ExtendedOverrides',
    ];
    const names = root.children.map((c) => c.name);
    expect(names.filter((n) => !SCHEMA_ORDER.includes(n))).toEqual([]);
    const positions = names.map((n) => SCHEMA_ORDER.indexOf(n));
    expect(positions).toEqual([...positions].sort((a, b) => a - b));
    expect(new Set(names).size).toBe(names.length);
    // Same page: Requirements holds Sets (then Methods); Sets holds Set elements only.
    expect(path(root, 'Requirements').children.map((c) => c.name)).toEqual(['Sets']);
    expect(path(root, 'Requirements', 'Sets').children.every((c) => c.name === 'Set')).toBe(true);
  });

  it("places the VersionOverrides elements in the schema's order", () => {
    // "How to find the proper order of manifest elements", Task pane add-in element ordering within
    // VersionOverrides (bt:Images etc. are the Images, Urls, ShortStrings and LongStrings there).
    const expectOrder = (el: El, order: string[]) => {
      const names = el.children.map((c) => c.name);
      expect(
        names.filter((n) => !order.includes(n)),
        `<${el.name}>`,
      ).toEqual([]);
      const positions = names.map((n) => order.indexOf(n));
      expect(positions, `<${el.name}>`).toEqual([...positions].sort((a, b) => a - b));
    };
    const overrides = path(root, 'VersionOverrides');
    expectOrder(overrides, ['Description', 'Requirements', 'Hosts', 'Resources', 'WebApplicationInfo', 'EquivalentAddins']);
    expectOrder(host, ['Runtimes', 'AllFormFactors', 'DesktopFormFactor']);
    expectOrder(customFunctionsPoint(), ['Script', 'Page', 'Metadata', 'Namespace']);
    expectOrder(path(host, 'DesktopFormFactor'), ['GetStarted', 'FunctionFile', 'ExtensionPoint']);
    expectOrder(path(host, 'DesktopFormFactor', 'GetStarted'), ['Title', 'Description', 'LearnMoreUrl']);
    expectOrder(path(overrides, 'Resources'), ['bt:Images', 'bt:Urls', 'bt:ShortStrings', 'bt:LongStrings']);
    for (const control of findAll(host, 'Control')) expectOrder(control, ['Label', 'Supertip', 'Icon', 'Action', 'Enabled', 'Items']);
  });

  it("carries package.json's version, so a release bumps one number", () => {
    // Version element reference: 1 to 4 parts of at most 5 digits; the build pads package.json's to four.
    const packageJson: unknown = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8'));
    const version = typeof packageJson === 'object' && packageJson !== null && 'version' in packageJson ? String(packageJson.version) : '';
    expect(path(root, 'Version').text).toBe(manifestVersion(undefined, version));
  });

  it('requires the shared runtime: the Runtimes element needs SharedRuntime 1.1', () => {
    // "Configure your Office Add-in to use a shared runtime": the manifest declares SharedRuntime 1.1.
    const sets = findAll(path(root, 'Requirements'), 'Set');
    expect(sets.find((s) => s.attrs.Name === 'SharedRuntime')?.attrs.MinVersion).toBe('1.1');
    expect(new Set(sets.map((s) => s.attrs.Name)).size).toBe(sets.length);
  });

  it('declares exactly the highest version of each requirement set that the code Excel loads uses', async () => {
    // The version of each member comes from the "[Api set: …]" remark of its Office JavaScript API
    // reference entry (carried by @types/office-js and @types/custom-functions-runtime). "Requirements
    // element": Office does not activate the add-in where a declared set is missing, so declaring
    // less lets it start where it will fail, and declaring more shuts users out for nothing.
    const used = requirementSetsUsed(ROOT, ['src/taskpane/index.tsx', 'src/functions/functions.ts'], ['src/preview']);
    for (const option of await metadataOptionsUsed()) {
      const need = METADATA_OPTION_SETS[option];
      if (!need) continue;
      const current = used.get(need.set);
      if (!current || compareVersions(need.version, current.version) > 0) used.set(need.set, { version: need.version, members: [option] });
      else if (compareVersions(need.version, current.version) === 0) current.members.push(option);
    }
    const declared = new Map(findAll(path(root, 'Requirements'), 'Set').map((s) => [s.attrs.Name, s.attrs.MinVersion ?? '1.1']));
    expect(used.get('CustomFunctionsRuntime')).toBeDefined();
    expect(used.get('ExcelApi')).toBeDefined();
    for (const [setName, use] of used) {
      expect(declared.get(setName), `${setName} (used by ${use.members.join(', ')})`).toBe(use.version);
    }
    for (const [setName, version] of declared) {
      if (setName === 'SharedRuntime') continue;
      const use = used.get(setName);
      expect(use, `${setName} ${version} is declared but nothing uses it`).toBeDefined();
      if (use) expect(compareVersions(version, use.version), setName).toBe(0);
    }
  }, 120_000);

  it('has a Home tab button that opens the pane, with our labels', () => {
    const tab = findAll(host, 'OfficeTab').find((t) => t.attrs.id === 'TabHome');
    expect(tab).toBeDefined();
    const group = tab ? child(tab, 'Group') : undefined;
    expect(group).toBeDefined();
    if (!group) return;
    expect(res.get(residOf(path(group, 'Label')))).toBe('Plumbline');
    const button = findAll(group, 'Control').find((c) => c.attrs['xsi:type'] === 'Button');
    expect(button).toBeDefined();
    if (!button) return;
    expect(res.get(residOf(path(button, 'Label')))).toBe('Open Plumbline');
    expect(path(button, 'Action').attrs['xsi:type']).toBe('ShowTaskpane');
  });

  it('defines every resid it references, within the 32-character limit', () => {
    const referenced = new Set(
      allElements(root)
        .map((e) => e.attrs.resid)
        .filter((r): r is string => r !== undefined),
    );
    expect(referenced.size).toBeGreaterThan(0);
    const undefinedIds = [...referenced].filter((r) => !res.has(r));
    expect(undefinedIds).toEqual([]);
    const tooLong = [...referenced].filter((r) => r.length > 32);
    expect(tooLong).toEqual([]);
  });

  it('defines no resource twice and none that go unused', () => {
    const ids = allElements(path(root, 'VersionOverrides', 'Resources'))
      .map((e) => e.attrs.id)
      .filter((r): r is string => r !== undefined);
    expect(ids.length).toBe(new Set(ids).size);
    const referenced = new Set(allElements(root).map((e) => e.attrs.resid));
    expect(ids.filter((id) => !referenced.has(id))).toEqual([]);
  });

  it('uses only https://localhost:3000 URLs and app domains', () => {
    const urls = urlsIn(root);
    expect(urls.length).toBeGreaterThan(0);
    const domains = findAll(root, 'AppDomain').map((d) => d.text);
    expect(domains).toEqual([ORIGIN]);
    const foreign = urls.filter((u) => !domains.includes(u) && !u.startsWith(`${ORIGIN}/`));
    expect(foreign).toEqual([]);
  });

  it.each(ICON_SIZES)('ships a %i px icon in assets/ that is really that size', (size) => {
    const url = `${ORIGIN}/assets/icon-${size}.png`;
    expect(urlsIn(root)).toContain(url);
    const file = join(ROOT, 'assets', `icon-${size}.png`);
    expect(existsSync(file)).toBe(true);
    expect(readPngHeader(readFileSync(file))).toEqual({ width: size, height: size });
  });

  it('declares ribbon image sizes that match the files they point to', () => {
    const images = findAll(host, 'bt:Image');
    expect(images.length).toBeGreaterThan(0);
    for (const image of images) {
      const url = res.get(residOf(image)) ?? '';
      expect(url.startsWith(`${ORIGIN}/assets/`)).toBe(true);
      const header = readPngHeader(readFileSync(join(ROOT, url.slice(ORIGIN.length + 1))));
      expect(header.width, url).toBe(Number(image.attrs.size));
    }
  });
});
