/**
 * The server behind `npm start` and the browser tests: it serves the build on localhost, refuses
 * paths outside it, and reports a busy port instead of silently failing.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { type RunningServer, startServer } from '../../scripts/staticServer';
import { ROOT } from '../support/manifest';

/** Cache-Control directives, lower-cased, e.g. ["public", "max-age=86400"]. */
function cacheDirectives(response: Response): string[] {
  return (response.headers.get('cache-control') ?? '')
    .split(',')
    .map((d) => d.trim().toLowerCase())
    .filter((d) => d !== '');
}

describe('static server', () => {
  let running: RunningServer;
  beforeAll(async () => {
    running = await startServer(inject('buildDir'), 0, false);
  });
  afterAll(() => running.close());

  it('serves the preview page, the bundles and functions.json', async () => {
    for (const path of ['/preview.html', '/preview.js', '/functions.js', '/taskpane.js', '/functions.json', '/manifest.xml']) {
      const response = await fetch(`${running.origin}${path}`);
      expect(response.status, path).toBe(200);
    }
    expect((await fetch(`${running.origin}/preview.html`)).headers.get('content-type')).toContain('text/html');
  });

  it('answers 404 for missing files and for paths that climb out of the build', async () => {
    expect((await fetch(`${running.origin}/nope.js`)).status).toBe(404);
    expect((await fetch(`${running.origin}/..%2Fpackage.json`)).status).toBe(404);
  });

  it('lets Office cache the icons', async () => {
    // "Office Add-ins manifest", Hosting requirements: image URIs must support caching; the server
    // shouldn't return Cache-Control no-cache, no-store or similar.
    for (const size of [16, 32, 64, 80]) {
      const response = await fetch(`${running.origin}/assets/icon-${size}.png`);
      expect(response.status).toBe(200);
      const directives = cacheDirectives(response);
      expect(directives.filter((d) => ['no-store', 'no-cache', 'private', 'max-age=0'].includes(d))).toEqual([]);
      const maxAge = Number(directives.find((d) => d.startsWith('max-age='))?.slice('max-age='.length));
      expect(maxAge).toBeGreaterThanOrEqual(3600);
    }
  });

  it('keeps the pages, bundles, metadata and manifest uncached, so a rebuild shows at the next reload', async () => {
    // common practice (no source): a development server must not serve yesterday's bundle.
    for (const path of ['/taskpane.html', '/functions.js', '/functions.json', '/manifest.xml']) {
      expect(cacheDirectives(await fetch(`${running.origin}${path}`)), path).toContain('no-store');
    }
  });

  it('serves the default build manifest exactly as the repository has it (default origin and version)', async () => {
    const served = await (await fetch(`${running.origin}/manifest.xml`)).text();
    expect(served).toBe(readFileSync(join(ROOT, 'manifest.xml'), 'utf8'));
  });

  it('rejects with EADDRINUSE when the port is taken', async () => {
    const port = Number(new URL(running.origin).port);
    await expect(startServer(inject('buildDir'), port, false)).rejects.toMatchObject({ code: 'EADDRINUSE' });
  });
});
