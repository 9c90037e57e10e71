/**
 * The server behind `npm start` and the browser tests: it serves the build on localhost, refuses
 * paths outside it, and reports a busy port instead of silently failing.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { type RunningServer, startServer } from '../../scripts/staticServer';

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

  it('rejects with EADDRINUSE when the port is taken', async () => {
    const port = Number(new URL(running.origin).port);
    await expect(startServer(inject('buildDir'), port, false)).rejects.toMatchObject({ code: 'EADDRINUSE' });
  });
});
