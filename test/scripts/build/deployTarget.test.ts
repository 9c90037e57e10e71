/**
 * PLUMB_ORIGIN and PLUMB_VERSION as the build reads them. The rules come from the add-in only
 * manifest reference (Version, AppDomain) and "Office Add-ins manifest" (Hosting requirements: https).
 */
import { describe, expect, it } from 'vitest';
import { DEV_BASE_URL, deployTarget, manifestVersion, parseBaseUrl } from '../../../scripts/build/deployTarget';

describe('deploy origin', () => {
  it('defaults to the localhost origin the repository manifest is written for', () => {
    expect(deployTarget({ packageVersion: '0.1.0' })).toEqual({ baseUrl: DEV_BASE_URL, appDomain: DEV_BASE_URL, version: '0.1.0.0' });
    expect(deployTarget({ origin: '', packageVersion: '0.1.0' }).baseUrl).toBe(DEV_BASE_URL);
  });

  it('keeps a path, drops a closing slash, and makes the AppDomain scheme://host[:port]', () => {
    expect(parseBaseUrl('https://stats.example.org/plumbline/')).toEqual({
      baseUrl: 'https://stats.example.org/plumbline',
      appDomain: 'https://stats.example.org',
    });
    expect(parseBaseUrl('https://addins.example.com:8443')).toEqual({
      baseUrl: 'https://addins.example.com:8443',
      appDomain: 'https://addins.example.com:8443',
    });
  });

  it('refuses anything but a plain https URL', () => {
    expect(() => parseBaseUrl('http://stats.example.org')).toThrow(/https/);
    expect(() => parseBaseUrl('stats.example.org')).toThrow(/not a URL/);
    expect(() => parseBaseUrl('https://stats.example.org/?v=1')).toThrow(/query/);
    expect(() => parseBaseUrl('https://user:pw@stats.example.org')).toThrow(/credentials/);
  });
});

describe('manifest version', () => {
  it('takes PLUMB_VERSION over package.json, padded to four parts', () => {
    expect(manifestVersion('2.0.1.7', '0.1.0')).toBe('2.0.1.7');
    expect(manifestVersion('3', '0.1.0')).toBe('3.0.0.0');
    expect(manifestVersion(undefined, '0.4.2')).toBe('0.4.2.0');
  });

  it('refuses what the Version element does not allow: more than 4 parts, more than 5 digits, pre-release tags', () => {
    expect(() => manifestVersion('1.2.3.4.5', '0.1.0')).toThrow(/1 to 4 numbers/);
    expect(() => manifestVersion('123456', '0.1.0')).toThrow(/5 digits/);
    expect(() => manifestVersion(undefined, '1.0.0-beta.1')).toThrow(/1 to 4 numbers/);
  });
});
