/**
 * Rewrites the repository's manifest.xml (written for https://localhost:3000) for a deploy target:
 * every URL moves under the target's base URL, the AppDomain becomes the target's scheme://host[:port],
 * and Version becomes the target's version. The text is edited in place, so ids, resources, comments
 * and layout stay byte for byte as they were.
 */
import { DEV_BASE_URL, type DeployTarget } from './deployTarget';

function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/'/g, '&apos;').replace(/"/g, '&quot;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

function replaceExactlyOnce(xml: string, pattern: RegExp, replacement: string, what: string): string {
  const matches = xml.match(new RegExp(pattern.source, 'g')) ?? [];
  if (matches.length !== 1) throw new Error(`manifest.xml must contain exactly one ${what}, found ${matches.length}`);
  return xml.replace(pattern, replacement);
}

export function manifestForTarget(devManifest: string, target: DeployTarget): string {
  const devBase = DEV_BASE_URL.replace(/[.]/g, '\\.');
  // Every mention of the dev origin must be a URL into it (followed by "/") or the AppDomain;
  // anything else (e.g. localhost:30000, or the bare origin elsewhere) would be left behind.
  const strays = devManifest.match(new RegExp(`${devBase}(?![/<])|(?<!<AppDomain>)${devBase}(?=<)`, 'g')) ?? [];
  if (strays.length > 0) throw new Error(`manifest.xml names ${DEV_BASE_URL} other than as a URL into it or as the AppDomain`);
  let xml = replaceExactlyOnce(devManifest, /<Version>[^<]*<\/Version>/, `<Version>${escapeXml(target.version)}</Version>`, '<Version>');
  xml = replaceExactlyOnce(
    xml,
    new RegExp(`<AppDomain>${devBase}</AppDomain>`),
    `<AppDomain>${escapeXml(target.appDomain)}</AppDomain>`,
    `<AppDomain>${DEV_BASE_URL}</AppDomain>`,
  );
  return xml.replace(new RegExp(`${devBase}/`, 'g'), `${escapeXml(target.baseUrl)}/`);
}
