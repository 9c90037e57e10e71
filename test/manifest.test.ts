import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import {
  type El,
  ORIGIN,
  ROOT,
  allElements,
  child,
  findAll,
  loadManifest,
  path,
  readPngHeader,
  resources,
  urlsIn,
  wellFormed,
} from "./support/manifest";

const GUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const ICON_SIZES = [16, 32, 64, 80];

let xml: string;
let root: El;
let host: El;
let res: Map<string, string>;

beforeAll(() => {
  ({ xml, root } = loadManifest());
  host = path(root, "VersionOverrides", "Hosts", "Host");
  res = resources(root);
});

function residOf(el: El): string {
  const id = el.attrs.resid;
  if (id === undefined) throw new Error(`<${el.name}> has no resid`);
  return id;
}

function customFunctionsPoint(): El {
  const points = findAll(path(host, "AllFormFactors"), "ExtensionPoint").filter(
    (e) => e.attrs["xsi:type"] === "CustomFunctions",
  );
  expect(points).toHaveLength(1);
  return points[0];
}

function showTaskpaneActions(): El[] {
  return findAll(host, "Action").filter((a) => a.attrs["xsi:type"] === "ShowTaskpane");
}

describe("manifest.xml", () => {
  it("is well-formed XML with a task pane OfficeApp root", () => {
    expect(wellFormed(xml)).toBe(true);
    expect(root.name).toBe("OfficeApp");
    expect(root.attrs["xsi:type"]).toBe("TaskPaneApp");
    expect(path(root, "VersionOverrides").attrs["xsi:type"]).toBe("VersionOverridesV1_0");
  });

  it("targets Excel workbooks", () => {
    expect(findAll(path(root, "Hosts"), "Host").map((h) => h.attrs.Name)).toEqual(["Workbook"]);
    expect(host.attrs["xsi:type"]).toBe("Workbook");
  });

  it("has a GUID Id and our provider name", () => {
    expect(path(root, "Id").text).toMatch(GUID);
    expect(path(root, "ProviderName").text).toBe("Plumbline");
  });

  it("declares exactly one long-lived runtime, first inside Host", () => {
    const runtimes = findAll(root, "Runtimes");
    expect(runtimes).toHaveLength(1);
    const list = runtimes[0].children.filter((c) => c.name === "Runtime");
    expect(list).toHaveLength(1);
    expect(list[0].attrs.lifetime).toBe("long");
    // The documented shape puts Runtimes directly after the Host start tag.
    expect(host.children[0]?.name).toBe("Runtimes");
  });

  it("points the runtime, functions page, FunctionFile and every ShowTaskpane at one resource", () => {
    const runtime = residOf(path(host, "Runtimes", "Runtime"));
    const page = residOf(path(customFunctionsPoint(), "Page", "SourceLocation"));
    const functionFile = residOf(path(host, "DesktopFormFactor", "FunctionFile"));
    const actions = showTaskpaneActions();
    expect(actions.length).toBeGreaterThan(0);
    const panes = actions.map((a) => residOf(path(a, "SourceLocation")));
    expect(new Set([runtime, page, functionFile, ...panes])).toEqual(new Set([runtime]));
    expect(res.get(runtime)).toBe(`${ORIGIN}/taskpane.html`);
  });

  it("loads the functions script and metadata the build emits", () => {
    const point = customFunctionsPoint();
    expect(res.get(residOf(path(point, "Script", "SourceLocation")))).toBe(`${ORIGIN}/functions.js`);
    expect(res.get(residOf(path(point, "Metadata", "SourceLocation")))).toBe(`${ORIGIN}/functions.json`);
  });

  it("puts the functions in the PLUMB namespace", () => {
    const ns = residOf(path(customFunctionsPoint(), "Namespace"));
    expect(res.get(ns)).toBe("PLUMB");
  });

  it("asks for ReadWriteDocument permission", () => {
    expect(path(root, "Permissions").text).toBe("ReadWriteDocument");
  });

  it("requires SharedRuntime 1.1 and CustomFunctionsRuntime 1.1", () => {
    const sets = findAll(path(root, "Requirements"), "Set");
    const versions = new Map(sets.map((s) => [s.attrs.Name, s.attrs.MinVersion]));
    expect(versions.get("SharedRuntime")).toBe("1.1");
    expect(versions.get("CustomFunctionsRuntime")).toBe("1.1");
  });

  it("has a Home tab button that opens the pane, with our labels", () => {
    const tab = findAll(host, "OfficeTab").find((t) => t.attrs.id === "TabHome");
    expect(tab).toBeDefined();
    const group = tab ? child(tab, "Group") : undefined;
    expect(group).toBeDefined();
    if (!group) return;
    expect(res.get(residOf(path(group, "Label")))).toBe("Plumbline");
    const button = findAll(group, "Control").find((c) => c.attrs["xsi:type"] === "Button");
    expect(button).toBeDefined();
    if (!button) return;
    expect(res.get(residOf(path(button, "Label")))).toBe("Open Plumbline");
    expect(path(button, "Action").attrs["xsi:type"]).toBe("ShowTaskpane");
  });

  it("defines every resid it references, within the 32-character limit", () => {
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

  it("defines no resource twice and none that go unused", () => {
    const ids = allElements(path(root, "VersionOverrides", "Resources"))
      .map((e) => e.attrs.id)
      .filter((r): r is string => r !== undefined);
    expect(ids.length).toBe(new Set(ids).size);
    const referenced = new Set(allElements(root).map((e) => e.attrs.resid));
    expect(ids.filter((id) => !referenced.has(id))).toEqual([]);
  });

  it("uses only https://localhost:3000 URLs and app domains", () => {
    const urls = urlsIn(root);
    expect(urls.length).toBeGreaterThan(0);
    const domains = findAll(root, "AppDomain").map((d) => d.text);
    expect(domains).toEqual([ORIGIN]);
    const foreign = urls.filter((u) => !domains.includes(u) && !u.startsWith(`${ORIGIN}/`));
    expect(foreign).toEqual([]);
  });

  it.each(ICON_SIZES)("ships a %i px icon in assets/ that is really that size", (size) => {
    const url = `${ORIGIN}/assets/icon-${size}.png`;
    expect(urlsIn(root)).toContain(url);
    const file = join(ROOT, "assets", `icon-${size}.png`);
    expect(existsSync(file)).toBe(true);
    expect(readPngHeader(readFileSync(file))).toEqual({ width: size, height: size });
  });

  it("declares ribbon image sizes that match the files they point to", () => {
    const images = findAll(host, "bt:Image");
    expect(images.length).toBeGreaterThan(0);
    for (const image of images) {
      const url = res.get(residOf(image)) ?? "";
      expect(url.startsWith(`${ORIGIN}/assets/`)).toBe(true);
      const header = readPngHeader(readFileSync(join(ROOT, url.slice(ORIGIN.length + 1))));
      expect(header.width, url).toBe(Number(image.attrs.size));
    }
  });
});
