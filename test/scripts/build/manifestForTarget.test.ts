/**
 * The manifest a deploy build writes: every URL under PLUMB_ORIGIN, the AppDomain in the form the
 * manifest reference requires, the chosen version, and nothing else changed. Checked on the
 * repository's own manifest.xml, rewritten for a sample origin with a path.
 */
import { describe, expect, it } from 'vitest';
import { DEV_BASE_URL, deployTarget } from '../../../scripts/build/deployTarget';
import { manifestForTarget } from '../../../scripts/build/manifestForTarget';
import { type El, allElements, findAll, loadManifest, parseXml, path, urlsIn, wellFormed } from '../../support/manifest';

const SAMPLE_ORIGIN = 'https://stats.example.org/plumbline';
const { xml: devXml, root: devRoot } = loadManifest();
const sample = deployTarget({ origin: SAMPLE_ORIGIN, version: '1.2.3.4', packageVersion: '0.1.0' });
const deployedXml = manifestForTarget(devXml, sample);
const deployed = parseXml(deployedXml);

/** Every id, resid and the OfficeApp Id, in document order: what Office keys the add-in and its parts on. */
function identifiers(root: El): string[] {
  return [path(root, 'Id').text, ...allElements(root).flatMap((e) => [e.attrs.id, e.attrs.resid].filter((v): v is string => v !== undefined))];
}

describe('manifest for a deploy origin', () => {
  it('is well-formed XML', () => {
    expect(wellFormed(deployedXml)).toBe(true);
  });

  it('puts every URL under the origin and leaves no localhost anywhere', () => {
    const urls = urlsIn(deployed);
    expect(urls.length).toBe(urlsIn(devRoot).length);
    const domains = findAll(deployed, 'AppDomain').map((d) => d.text);
    const outside = urls.filter((u) => !domains.includes(u) && !u.startsWith(`${SAMPLE_ORIGIN}/`));
    expect(outside).toEqual([]);
    expect(deployedXml).not.toMatch(/localhost/i);
  });

  it('sets the AppDomain to scheme://host without path or closing slash', () => {
    // AppDomain reference: include the protocol, no URL segments past the domain, no closing "/".
    expect(findAll(deployed, 'AppDomain').map((d) => d.text)).toEqual(['https://stats.example.org']);
  });

  it('keeps every id and resid', () => {
    expect(identifiers(deployed)).toEqual(identifiers(devRoot));
  });

  it('carries the chosen version', () => {
    expect(path(deployed, 'Version').text).toBe('1.2.3.4');
  });

  it('changes nothing but the URLs, the AppDomain and the version', () => {
    const back = deployedXml
      .replace('<Version>1.2.3.4</Version>', `<Version>${path(devRoot, 'Version').text}</Version>`)
      .replace('<AppDomain>https://stats.example.org</AppDomain>', `<AppDomain>${DEV_BASE_URL}</AppDomain>`)
      .split(`${SAMPLE_ORIGIN}/`)
      .join(`${DEV_BASE_URL}/`);
    expect(back).toBe(devXml);
  });

  it('leaves the manifest byte for byte as it is for the default origin and version', () => {
    const version = path(devRoot, 'Version').text;
    expect(manifestForTarget(devXml, deployTarget({ packageVersion: version }))).toBe(devXml);
  });

  it('escapes a path character that XML reserves', () => {
    const odd = manifestForTarget(devXml, deployTarget({ origin: 'https://host.example/a&b', packageVersion: '1' }));
    expect(wellFormed(odd)).toBe(true);
    expect(urlsIn(parseXml(odd)).every((u) => u.startsWith('https://host.example/a&b/') || u === 'https://host.example')).toBe(true);
  });

  it('refuses a manifest that names the dev origin other than as a URL into it or as the AppDomain', () => {
    // common practice (no source): a rewrite must not silently leave a URL behind.
    const stray = devXml.replace(
      '<SupportUrl DefaultValue="https://localhost:3000/taskpane.html"/>',
      '<SupportUrl DefaultValue="https://localhost:30000/x.html"/>',
    );
    expect(stray).not.toBe(devXml);
    expect(() => manifestForTarget(stray, sample)).toThrow(/other than as a URL/);
  });
});
