// Builds the add-in the way `npm run build` does, but into a temporary folder so
// the test never clobbers dist/ or races a developer's build.
import { existsSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { createRequire } from "node:module";
import { tmpdir } from "node:os";
import { join } from "node:path";
import webpack, { type Configuration, type Stats } from "webpack";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ORIGIN, ROOT, loadManifest, urlsIn } from "./support/manifest";

// Every PLUMB cell function spills a grid, so each result is a matrix in functions.json.
const EXPECTED_FUNCTIONS: ReadonlyArray<{ id: string; dimensionality: string }> = [
  "TERMS", "ESTIMATES", "STDERRORS", "INTERVALS", "COVARIANCE", "FITSTATS", "NESTEDF", "PREDICT", "RESIDUALS", "QQPOINTS",
  "COLLINEARITY", "CHECKS", "COMPARE",
].map((id) => ({ id, dimensionality: "matrix" }));

const OFFICE_JS = "https://appsforoffice.microsoft.com/lib/1/hosted/office.js";

type ConfigFactory = (env: { outputPath: string }, argv: { mode: "production" }) => Configuration;

interface FunctionMetadata {
  id: string;
  name: string;
  result?: { dimensionality?: string };
}

let outDir: string;
let stats: Stats;

function runWebpack(config: Configuration): Promise<Stats> {
  return new Promise((resolve, reject) => {
    const compiler = webpack(config);
    compiler.run((err, result) => {
      compiler.close(() => {
        if (err) reject(err);
        else if (!result) reject(new Error("webpack returned no stats"));
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

function readFunctions(): FunctionMetadata[] {
  const parsed: unknown = JSON.parse(readFileSync(join(outDir, "functions.json"), "utf8"));
  const list = typeof parsed === "object" && parsed !== null && "functions" in parsed ? parsed.functions : undefined;
  if (!Array.isArray(list)) throw new Error("functions.json has no functions array");
  const items: unknown[] = list;
  // The generator's schema is trusted beyond this shape check; the tests assert the fields they rely on.
  return items as FunctionMetadata[];
}

beforeAll(async () => {
  outDir = mkdtempSync(join(tmpdir(), "plumbline-build-"));
  const factory = createRequire(import.meta.url)(join(ROOT, "webpack.config.js")) as ConfigFactory;
  stats = await runWebpack(factory({ outputPath: outDir }, { mode: "production" }));
}, 180_000);

afterAll(() => {
  if (outDir) rmSync(outDir, { recursive: true, force: true });
});

describe("production build", () => {
  it("compiles without errors", () => {
    const { errors } = stats.toJson({ all: false, errors: true });
    expect(errors?.map((e) => e.message) ?? []).toEqual([]);
    expect(stats.hasErrors()).toBe(false);
  });

  it("writes functions.json listing exactly the expected functions", () => {
    expect(existsSync(join(outDir, "functions.json"))).toBe(true);
    const functions = readFunctions();
    expect(functions.map((f) => f.id).sort()).toEqual(EXPECTED_FUNCTIONS.map((f) => f.id).sort());
  });

  it.each(EXPECTED_FUNCTIONS)("describes $id with a $dimensionality result", ({ id, dimensionality }) => {
    const fn = readFunctions().find((f) => f.id === id);
    expect(fn?.name).toBe(id);
    expect(fn?.result?.dimensionality).toBe(dimensionality);
  });

  it.each(EXPECTED_FUNCTIONS)("registers $id in functions.js", ({ id }) => {
    const js = readFileSync(join(outDir, "functions.js"), "utf8");
    expect(js).toContain(`CustomFunctions.associate("${id}"`);
  });

  it("makes taskpane.html load Office.js, then the functions bundle, then the pane", () => {
    const sources = scriptSources(readFileSync(join(outDir, "taskpane.html"), "utf8"));
    const local = sources.map((s) => s.replace(/^\.?\//, ""));
    expect(sources[0]).toBe(OFFICE_JS);
    const fnIndex = local.indexOf("functions.js");
    const paneIndex = local.indexOf("taskpane.js");
    expect(fnIndex).toBeGreaterThan(0);
    expect(paneIndex).toBeGreaterThan(fnIndex);
  });

  it("makes preview.html load the shim first, then the unmodified functions and pane bundles, and nothing external", () => {
    const sources = scriptSources(readFileSync(join(outDir, "preview.html"), "utf8")).map((s) => s.replace(/^\.?\//, ""));
    expect(sources).toEqual(["runtime.js", "preview.js", "engine.js", "functions.js", "taskpane.js"]);
  });

  it("ships the engine once, in a chunk both the functions and the pane use, so they share one fit cache", () => {
    // An engine error message stands for the engine's code: it survives minification.
    const marker = "more rows than parameters";
    expect(readFileSync(join(outDir, "engine.js"), "utf8")).toContain(marker);
    for (const bundle of ["functions.js", "taskpane.js", "preview.js"]) {
      expect(readFileSync(join(outDir, bundle), "utf8")).not.toContain(marker);
    }
  });

  it("loads no external script other than Office.js", () => {
    const sources = scriptSources(readFileSync(join(outDir, "taskpane.html"), "utf8"));
    const external = sources.filter((s) => /^(https?:)?\/\//i.test(s));
    expect(external).toEqual([OFFICE_JS]);
  });

  it("emits every file the manifest points at", () => {
    const { root } = loadManifest();
    const paths = [...new Set(urlsIn(root).filter((u) => u.startsWith(`${ORIGIN}/`)))].map((u) =>
      new URL(u).pathname.slice(1),
    );
    expect(paths.length).toBeGreaterThan(0);
    const missing = paths.filter((p) => !existsSync(join(outDir, p)));
    expect(missing).toEqual([]);
  });

  it("copies manifest.xml unchanged", () => {
    expect(readFileSync(join(outDir, "manifest.xml"), "utf8")).toBe(readFileSync(join(ROOT, "manifest.xml"), "utf8"));
  });
});

/** The page's Content-Security-Policy meta tag, as directive name → sources, and where it sits. */
function pagePolicy(html: string): { directives: Map<string, string[]>; index: number } | undefined {
  for (const tag of html.matchAll(/<meta\b([^>]*)>/gi)) {
    if (!/\bhttp-equiv\s*=\s*["']?Content-Security-Policy\b/i.test(tag[1])) continue;
    const content = /\bcontent\s*=\s*(?:"([^"]*)"|'([^']*)')/i.exec(tag[1]);
    if (!content) return undefined;
    const directives = new Map<string, string[]>();
    for (const part of (content[1] ?? content[2]).split(";")) {
      const [name, ...sources] = part.trim().split(/\s+/);
      if (name) directives.set(name.toLowerCase(), sources);
    }
    return { directives, index: tag.index ?? -1 };
  }
  return undefined;
}

describe("Content-Security-Policy of the built pages", () => {
  // The pane may load Office.js from Microsoft's CDN; the preview uses the shim and loads nothing external.
  const PAGES = [
    { page: "taskpane.html", scripts: ["'self'", "https://appsforoffice.microsoft.com"] },
    { page: "preview.html", scripts: ["'self'"] },
  ];

  it.each(PAGES)("$page carries a policy before any script that keeps everything on its own origin", ({ page, scripts }) => {
    const html = readFileSync(join(outDir, page), "utf8");
    const policy = pagePolicy(html);
    expect(policy, `${page} has no CSP meta tag`).toBeDefined();
    if (!policy) return;
    const { directives } = policy;
    const firstScript = html.search(/<script\b/i);
    expect(firstScript).toBeGreaterThan(policy.index);
    expect(directives.get("default-src")).toEqual(["'self'"]);
    expect(directives.get("script-src")).toEqual(scripts);
    expect(directives.get("connect-src")).toEqual(["'self'"]);
    expect(directives.get("object-src")).toEqual(["'none'"]);
    expect(directives.get("base-uri")).toEqual(["'none'"]);
    expect(directives.get("form-action")).toEqual(["'none'"]);
    const style = directives.get("style-src") ?? [];
    expect(style).toContain("'self'");
    expect(style.filter((s) => s !== "'self'" && s !== "'unsafe-inline'")).toEqual([]);
    // No wildcard, eval or scheme-wide source anywhere: each would reopen a way out.
    const everySource = [...directives.values()].flat();
    expect(everySource.filter((s) => s.includes("*") || s === "'unsafe-eval'" || /^(https?|wss?):$/i.test(s))).toEqual([]);
    expect(directives.get("script-src")).not.toContain("'unsafe-inline'");
  });

  it.each(PAGES)("$page loads only scripts its policy allows", ({ page, scripts }) => {
    const sources = scriptSources(readFileSync(join(outDir, page), "utf8"));
    expect(sources.length).toBeGreaterThan(0);
    const blocked = sources.filter((s) => /^(https?:)?\/\//i.test(s) && !scripts.includes(new URL(s, "https://localhost:3000").origin));
    expect(blocked).toEqual([]);
  });
});
