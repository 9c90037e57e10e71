// Builds the add-in the way `PLUMB_ORIGIN=… PLUMB_VERSION=… npm run build` does, but into a
// temporary folder so the test never clobbers dist/ or races a developer's build. (The default
// build, for https://localhost:3000, is the one the browser tests serve.)
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import webpack, { type Configuration, type Stats } from 'webpack';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deployTarget } from '../scripts/build/deployTarget';
import { manifestForTarget } from '../scripts/build/manifestForTarget';
import { ROOT, loadManifest, parseXml, urlsIn } from './support/manifest';

const SAMPLE_ORIGIN = 'https://stats.example.org/plumbline';
const SAMPLE_VERSION = '1.2.3.4';
const FUNCTIONS_SOURCE = join(ROOT, 'src/functions/functions.ts');

// Every PLUMB cell function spills a grid, so each result is a matrix in functions.json.
const EXPECTED_FUNCTIONS: ReadonlyArray<{ id: string; dimensionality: string }> = [
  'TERMS',
  'ESTIMATES',
  'STDERRORS',
  'INTERVALS',
  'COVARIANCE',
  'FITSTATS',
  'NESTEDF',
  'PREDICT',
  'RESIDUALS',
  'QQPOINTS',
  'COLLINEARITY',
  'CHECKS',
  'COMPARE',
  'GATHER',
  'EQUATION',
].map((id) => ({ id, dimensionality: 'matrix' }));

const OFFICE_JS = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';

type ConfigFactory = (env: { outputPath: string }, argv: { mode: 'production' }) => Configuration;

interface FunctionMetadata {
  id: string;
  name: string;
  parameters: { name: string; type?: string }[];
  result?: { dimensionality?: string };
}

interface MetadataPluginClass {
  generateResults: Record<string, { metadataJson: string }>;
}

let outDir: string;
let stats: Stats;

function runWebpack(config: Configuration): Promise<Stats> {
  return new Promise((resolve, reject) => {
    const compiler = webpack(config);
    compiler.run((err, result) => {
      compiler.close(() => {
        if (err) reject(err);
        else if (!result) reject(new Error('webpack returned no stats'));
        else resolve(result);
      });
    });
  });
}

function scriptSources(html: string): string[] {
  const sources: string[] = [];
  for (const tag of html.matchAll(/<script\b([^>]*)>/gi)) {
    // Minified output drops attribute quotes, so accept quoted and bare values.
    const src = /\bsrc\s*=\s*(?:"([^"]*)"|'([^']*)'|([^\s>]+))/i.exec(tag[1]);
    if (src) sources.push(src[1] ?? src[2] ?? src[3]);
  }
  return sources;
}

function readMetadata(): Record<string, unknown> {
  const parsed: unknown = JSON.parse(readFileSync(join(outDir, 'functions.json'), 'utf8'));
  if (typeof parsed !== 'object' || parsed === null || Array.isArray(parsed)) throw new Error('functions.json is not an object');
  return parsed as Record<string, unknown>;
}

function readFunctions(): FunctionMetadata[] {
  const parsed = readMetadata();
  const list = typeof parsed === 'object' && parsed !== null && 'functions' in parsed ? parsed.functions : undefined;
  if (!Array.isArray(list)) throw new Error('functions.json has no functions array');
  const items: unknown[] = list;
  // The generator's schema is trusted beyond this shape check; the tests assert the fields they rely on.
  return items as FunctionMetadata[];
}

beforeAll(async () => {
  outDir = mkdtempSync(join(tmpdir(), 'plumbline-build-'));
  const factory = createRequire(import.meta.url)(join(ROOT, 'webpack.config.js')) as ConfigFactory;
  // The documented interface is the environment, so the test sets it, and restores it at once.
  const saved = { origin: process.env.PLUMB_ORIGIN, version: process.env.PLUMB_VERSION };
  process.env.PLUMB_ORIGIN = SAMPLE_ORIGIN;
  process.env.PLUMB_VERSION = SAMPLE_VERSION;
  let config: Configuration;
  try {
    config = factory({ outputPath: outDir }, { mode: 'production' });
  } finally {
    if (saved.origin === undefined) delete process.env.PLUMB_ORIGIN;
    else process.env.PLUMB_ORIGIN = saved.origin;
    if (saved.version === undefined) delete process.env.PLUMB_VERSION;
    else process.env.PLUMB_VERSION = saved.version;
  }
  stats = await runWebpack(config);
}, 180_000);

afterAll(() => {
  if (outDir) rmSync(outDir, { recursive: true, force: true });
});

describe('production build', () => {
  it('compiles without errors', () => {
    const { errors } = stats.toJson({ all: false, errors: true });
    expect(errors?.map((e) => e.message) ?? []).toEqual([]);
    expect(stats.hasErrors()).toBe(false);
  });

  it('writes functions.json listing exactly the expected functions', () => {
    expect(existsSync(join(outDir, 'functions.json'))).toBe(true);
    const functions = readFunctions();
    expect(functions.map((f) => f.id).sort()).toEqual(EXPECTED_FUNCTIONS.map((f) => f.id).sort());
  });

  it.each(EXPECTED_FUNCTIONS)('describes $id with a $dimensionality result', ({ id, dimensionality }) => {
    const fn = readFunctions().find((f) => f.id === id);
    expect(fn?.name).toBe(id);
    expect(fn?.result?.dimensionality).toBe(dimensionality);
  });

  it('lets error values reach every parameter of every function: allowErrorForDataTypeAny at the top level, every parameter of type any', () => {
    // "Manually create JSON metadata for custom functions", allowErrorForDataTypeAny: a top-level
    // Boolean that lets parameters of type any (a parameter without type is any) accept errors.
    const metadata = readMetadata();
    expect(metadata.allowErrorForDataTypeAny).toBe(true);
    const functions = readFunctions();
    const parameters = functions.flatMap((f) => f.parameters.map((p) => ({ at: `${f.id}.${p.name}`, type: p.type ?? 'any' })));
    expect(parameters.length).toBeGreaterThan(functions.length);
    expect(parameters.filter((p) => p.type !== 'any')).toEqual([]);
  });

  it("gets that flag from the build's post-processing: the JSDoc generation alone never writes it", () => {
    // "Handle and return errors from your custom function", Errors as custom function inputs: the
    // property doesn't come from the autogenerated JSON metadata process.
    const plugin = createRequire(join(ROOT, 'webpack.config.js'))('custom-functions-metadata-plugin') as MetadataPluginClass;
    const generated: unknown = JSON.parse(plugin.generateResults[FUNCTIONS_SOURCE]?.metadataJson ?? 'null');
    expect(generated).toMatchObject({ functions: expect.any(Array) });
    expect(JSON.stringify(generated)).not.toContain('allowErrorForDataTypeAny');
  });

  it.each(EXPECTED_FUNCTIONS)('registers $id in functions.js', ({ id }) => {
    const js = readFileSync(join(outDir, 'functions.js'), 'utf8');
    expect(js).toContain(`CustomFunctions.associate("${id}"`);
  });

  it('makes taskpane.html load Office.js, then the functions bundle, then the pane', () => {
    const sources = scriptSources(readFileSync(join(outDir, 'taskpane.html'), 'utf8'));
    const local = sources.map((s) => s.replace(/^\.?\//, ''));
    expect(sources[0]).toBe(OFFICE_JS);
    const fnIndex = local.indexOf('functions.js');
    const paneIndex = local.indexOf('taskpane.js');
    expect(fnIndex).toBeGreaterThan(0);
    expect(paneIndex).toBeGreaterThan(fnIndex);
  });

  it('makes preview.html load the shim first, then the unmodified functions and pane bundles, and nothing external', () => {
    const sources = scriptSources(readFileSync(join(outDir, 'preview.html'), 'utf8')).map((s) => s.replace(/^\.?\//, ''));
    expect(sources).toEqual(['runtime.js', 'preview.js', 'engine.js', 'functions.js', 'taskpane.js']);
  });

  it('ships the engine once, in a chunk both the functions and the pane use, so they share one fit cache', () => {
    // An engine error message stands for the engine's code: it survives minification.
    const marker = 'more rows than parameters';
    expect(readFileSync(join(outDir, 'engine.js'), 'utf8')).toContain(marker);
    for (const bundle of ['functions.js', 'taskpane.js', 'preview.js']) {
      expect(readFileSync(join(outDir, bundle), 'utf8')).not.toContain(marker);
    }
  });

  it('emits the formula worker as its own script, loading the one engine chunk rather than a copy of it', () => {
    const worker = readFileSync(join(outDir, 'formula-worker.js'), 'utf8');
    expect(worker).not.toContain('more rows than parameters');
    expect(worker).toContain('engine.js');
    expect(worker).toContain('importScripts');
  });

  it('loads no external script other than Office.js', () => {
    const sources = scriptSources(readFileSync(join(outDir, 'taskpane.html'), 'utf8'));
    const external = sources.filter((s) => /^(https?:)?\/\//i.test(s));
    expect(external).toEqual([OFFICE_JS]);
  });

  it('writes manifest.xml for PLUMB_ORIGIN and PLUMB_VERSION, with no localhost left', () => {
    const built = readFileSync(join(outDir, 'manifest.xml'), 'utf8');
    const expected = manifestForTarget(loadManifest().xml, deployTarget({ origin: SAMPLE_ORIGIN, version: SAMPLE_VERSION, packageVersion: '0' }));
    expect(built).toBe(expected);
    expect(built).not.toMatch(/localhost/i);
    expect(parseXml(built).children.find((c) => c.name === 'Version')?.text).toBe(SAMPLE_VERSION);
  });

  it("emits every file the built manifest points at, under the origin's path", () => {
    const root = parseXml(readFileSync(join(outDir, 'manifest.xml'), 'utf8'));
    const paths = [...new Set(urlsIn(root).filter((u) => u.startsWith(`${SAMPLE_ORIGIN}/`)))].map((u) => u.slice(SAMPLE_ORIGIN.length + 1));
    expect(paths.length).toBeGreaterThan(0);
    const missing = paths.filter((p) => !existsSync(join(outDir, p)));
    expect(missing).toEqual([]);
  });
});

/** The page's Content-Security-Policy meta tag, as directive name → sources, and where it sits. */
function pagePolicy(html: string): { directives: Map<string, string[]>; index: number } | undefined {
  for (const tag of html.matchAll(/<meta\b([^>]*)>/gi)) {
    if (!/\bhttp-equiv\s*=\s*["']?Content-Security-Policy\b/i.test(tag[1])) continue;
    const content = /\bcontent\s*=\s*(?:"([^"]*)"|'([^']*)')/i.exec(tag[1]);
    if (!content) return undefined;
    const directives = new Map<string, string[]>();
    for (const part of (content[1] ?? content[2]).split(';')) {
      const [name, ...sources] = part.trim().split(/\s+/);
      if (name) directives.set(name.toLowerCase(), sources);
    }
    return { directives, index: tag.index ?? -1 };
  }
  return undefined;
}

describe('Content-Security-Policy of the built pages', () => {
  // The pane may load Office.js from Microsoft's CDN; the preview uses the shim and loads nothing external.
  const PAGES = [
    { page: 'taskpane.html', scripts: ["'self'", 'https://appsforoffice.microsoft.com'] },
    { page: 'preview.html', scripts: ["'self'"] },
  ];

  it.each(PAGES)('$page carries a policy before any script that keeps everything on its own origin', ({ page, scripts }) => {
    const html = readFileSync(join(outDir, page), 'utf8');
    const policy = pagePolicy(html);
    expect(policy, `${page} has no CSP meta tag`).toBeDefined();
    if (!policy) return;
    const { directives } = policy;
    const firstScript = html.search(/<script\b/i);
    expect(firstScript).toBeGreaterThan(policy.index);
    expect(directives.get('default-src')).toEqual(["'self'"]);
    expect(directives.get('script-src')).toEqual(scripts);
    expect(directives.get('connect-src')).toEqual(["'self'"]);
    // The formula worker (src/functions/offThread) is a script of the page's own origin.
    expect(directives.get('worker-src')).toEqual(["'self'"]);
    expect(directives.get('object-src')).toEqual(["'none'"]);
    expect(directives.get('base-uri')).toEqual(["'none'"]);
    expect(directives.get('form-action')).toEqual(["'none'"]);
    const style = directives.get('style-src') ?? [];
    expect(style).toContain("'self'");
    expect(style.filter((s) => s !== "'self'" && s !== "'unsafe-inline'")).toEqual([]);
    // No wildcard, eval or scheme-wide source anywhere: each would reopen a way out.
    const everySource = [...directives.values()].flat();
    expect(everySource.filter((s) => s.includes('*') || s === "'unsafe-eval'" || /^(https?|wss?):$/i.test(s))).toEqual([]);
    expect(directives.get('script-src')).not.toContain("'unsafe-inline'");
  });

  it.each(PAGES)('$page loads only scripts its policy allows', ({ page, scripts }) => {
    const sources = scriptSources(readFileSync(join(outDir, page), 'utf8'));
    expect(sources.length).toBeGreaterThan(0);
    const blocked = sources.filter((s) => /^(https?:)?\/\//i.test(s) && !scripts.includes(new URL(s, 'https://localhost:3000').origin));
    expect(blocked).toEqual([]);
  });
});
