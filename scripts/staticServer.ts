/**
 * Serves the built add-in (dist/) on localhost only. Used by `npm start` and by the browser
 * tests, which pass port 0 to get a free port. A deployed build is served by any static https
 * host instead (README, "Deploy for your team").
 */
import { createReadStream, existsSync, readFileSync, statSync } from 'node:fs';
import { createServer as createHttpServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import { createServer as createHttpsServer } from 'node:https';
import { homedir } from 'node:os';
import { extname, join, normalize, resolve, sep } from 'node:path';

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.png': 'image/png',
  '.xml': 'application/xml; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
};

/**
 * "Office Add-ins manifest", Hosting requirements: image URIs must support caching, and the server
 * hosting them shouldn't send a Cache-Control of no-cache, no-store or similar. The pages, bundles
 * and metadata stay no-store, so a rebuild shows at the next reload during development; the icons
 * are fixed files (scripts/make-icons.ts) and may be kept for a day.
 */
export function cachePolicy(file: string): string {
  return TYPES[extname(file)]?.startsWith('image/') ? 'public, max-age=86400' : 'no-store';
}

export interface RunningServer {
  server: Server;
  origin: string;
  close(): Promise<void>;
}

/** office-addin-dev-certs' files, when a developer has made them; Excel needs https. */
export function devCertificates(): { key: Buffer; cert: Buffer; ca: Buffer } | undefined {
  const dir = join(homedir(), '.office-addin-dev-certs');
  const files = ['localhost.key', 'localhost.crt', 'ca.crt'].map((f) => join(dir, f));
  if (!files.every((f) => existsSync(f))) return undefined;
  const [key, cert, ca] = files.map((f) => readFileSync(f));
  return { key, cert, ca };
}

function handler(root: string) {
  return (request: IncomingMessage, response: ServerResponse) => {
    const path = decodeURIComponent(new URL(request.url ?? '/', 'http://localhost').pathname);
    const file = normalize(join(root, path === '/' ? 'preview.html' : path));
    if (!file.startsWith(root + sep) || !existsSync(file) || !statSync(file).isFile()) {
      response.writeHead(404, { 'Content-Type': 'text/plain; charset=utf-8' });
      response.end('Not found');
      return;
    }
    response.writeHead(200, {
      'Content-Type': TYPES[extname(file)] ?? 'application/octet-stream',
      'Cache-Control': cachePolicy(file),
      // Excel on the web fetches functions.json from its own origin.
      'Access-Control-Allow-Origin': '*',
    });
    createReadStream(file).pipe(response);
  };
}

export function startServer(distDir: string, port: number, useHttps: boolean): Promise<RunningServer> {
  const root = resolve(distDir);
  const certificates = useHttps ? devCertificates() : undefined;
  const server = certificates ? createHttpsServer(certificates, handler(root)) : createHttpServer(handler(root));
  return new Promise((resolveStart, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      const address = server.address();
      const actualPort = typeof address === 'object' && address !== null ? address.port : port;
      resolveStart({
        server,
        origin: `${certificates ? 'https' : 'http'}://localhost:${actualPort}`,
        close: () => new Promise((done) => server.close(() => done())),
      });
    });
  });
}
