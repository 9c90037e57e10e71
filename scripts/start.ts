// `npm start`: builds (via the npm script) and then summarises the add-in.
// Until a browser preview exists this only tells a developer what was built
// and how to get it into Excel; each part is a function so later work (a demo
// fit) can slot in beside them.
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";

const ROOT = join(__dirname, "..");
const DIST = join(ROOT, "dist");

interface FunctionSummary {
  id: string;
  description: string;
}

function listFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = join(dir, name);
    return statSync(full).isDirectory() ? listFiles(full) : [full];
  });
}

function describeDist(dist: string): string[] {
  return listFiles(dist)
    .sort()
    .map((file) => `  ${relative(dist, file).padEnd(24)} ${statSync(file).size} bytes`);
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null;
}

function readFunctions(dist: string): FunctionSummary[] {
  const parsed: unknown = JSON.parse(readFileSync(join(dist, "functions.json"), "utf8"));
  const list: unknown = isRecord(parsed) ? parsed.functions : undefined;
  if (!Array.isArray(list)) throw new Error("dist/functions.json has no functions array");
  const items: unknown[] = list;
  return items.filter(isRecord).map((f) => ({
    id: String(f.id),
    description: typeof f.description === "string" ? f.description : "",
  }));
}

function loadingInstructions(): string[] {
  return [
    "Serve the files over https on localhost:3000 (Office refuses plain http):",
    "  npx office-addin-dev-certs install     # once, trusts a localhost certificate",
    "  npm run serve                          # webpack dev server on https://localhost:3000",
    "",
    "Excel desktop (Windows or Mac), sideloads manifest.xml and opens Excel:",
    "  npx office-addin-debugging start manifest.xml",
    "  (it expects the server above to be running; add --dev-server \"npm run serve\" to have it start one)",
    "",
    "Excel on the web:",
    "  Insert > Add-ins > Upload My Add-in, then choose manifest.xml.",
    "",
    "Then type =PLUMB.TERMS(B2:B61, C2:F61) next to your data, or use Home > Open Plumbline for the pane.",
  ];
}

function main(): void {
  if (!existsSync(join(DIST, "functions.json"))) {
    console.error("dist/ has no build yet: run `npm run build` (or `npm start`, which builds first).");
    process.exitCode = 1;
    return;
  }
  const sections: Array<[string, string[]]> = [
    ["Built files (dist/)", describeDist(DIST)],
    ["Cell functions", readFunctions(DIST).map((f) => `  PLUMB.${f.id.padEnd(16)} ${f.description}`)],
    ["Loading Plumbline into Excel", loadingInstructions().map((l) => (l ? `  ${l}` : l))],
  ];
  for (const [title, lines] of sections) console.log(`\n${title}\n${"-".repeat(title.length)}\n${lines.join("\n")}`);
}

main();
