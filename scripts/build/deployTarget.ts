/**
 * Where a build will be served from and which version it carries, from `PLUMB_ORIGIN` and
 * `PLUMB_VERSION` (or package.json's version). Read by webpack.config.js.
 */

/** The origin the repository's manifest.xml is written for: `npm start` serves it. */
export const DEV_BASE_URL = 'https://localhost:3000';

export interface DeployTarget {
  /** Every URL of the add-in starts with this, without a trailing slash (it may carry a path). */
  baseUrl: string;
  /** scheme://host[:port] of baseUrl: the form an AppDomain must take (manifest reference, AppDomain). */
  appDomain: string;
  /** The manifest Version: one to four dot-separated parts of at most 5 digits (manifest reference, Version). */
  version: string;
}

const VERSION_PATTERN = /^\d{1,5}(\.\d{1,5}){0,3}$/;

/**
 * Office loads add-ins only over https ("Office Add-ins manifest", Hosting requirements), so any
 * other scheme is refused here rather than producing a manifest no Office will load.
 */
export function parseBaseUrl(origin: string): { baseUrl: string; appDomain: string } {
  let url: URL;
  try {
    url = new URL(origin);
  } catch {
    throw new Error(`PLUMB_ORIGIN is not a URL: ${JSON.stringify(origin)}`);
  }
  if (url.protocol !== 'https:') throw new Error(`PLUMB_ORIGIN must be an https URL (Office loads add-ins only over https): ${origin}`);
  if (url.username || url.password || url.search || url.hash) {
    throw new Error(`PLUMB_ORIGIN must be a plain https://host[:port][/path], without credentials, query or fragment: ${origin}`);
  }
  const path = url.pathname.replace(/\/+$/, '');
  return { baseUrl: `${url.origin}${path}`, appDomain: url.origin };
}

/**
 * The manifest version: `PLUMB_VERSION` when set, otherwise package.json's version. A three-part
 * package version gets a fourth part 0, so `0.1.0` becomes `0.1.0.0`; other forms are refused.
 */
export function manifestVersion(requested: string | undefined, packageVersion: string): string {
  const source = requested !== undefined && requested !== '' ? requested : packageVersion;
  if (!VERSION_PATTERN.test(source)) {
    throw new Error(`The manifest version must be 1 to 4 numbers of at most 5 digits separated by dots (for example 1.2.3.4): ${JSON.stringify(source)}`);
  }
  const parts = source.split('.');
  while (parts.length < 4) parts.push('0');
  return parts.join('.');
}

export interface DeploySettings {
  origin?: string;
  version?: string;
  packageVersion: string;
}

export function deployTarget(settings: DeploySettings): DeployTarget {
  const origin = settings.origin !== undefined && settings.origin !== '' ? settings.origin : DEV_BASE_URL;
  return { ...parseBaseUrl(origin), version: manifestVersion(settings.version, settings.packageVersion) };
}
