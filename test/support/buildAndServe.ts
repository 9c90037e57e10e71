/**
 * Vitest global setup: builds the add-in once into a temporary folder, exactly as `npm run build`
 * does, and serves it on a free localhost port for the browser tests of every project.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import webpack, { type Configuration } from 'webpack';
import type { TestProject } from 'vitest/node';
import { startServer } from '../../scripts/staticServer';

declare module 'vitest' {
  export interface ProvidedContext {
    previewOrigin: string;
    buildDir: string;
  }
}

type ConfigFactory = (env: { outputPath: string }, argv: { mode: 'production' }) => Configuration;

function build(outputPath: string): Promise<void> {
  const factory = createRequire(__filename)('../../webpack.config.js') as ConfigFactory;
  return new Promise((resolve, reject) => {
    const compiler = webpack(factory({ outputPath }, { mode: 'production' }));
    compiler.run((error, stats) => {
      compiler.close(() => {
        if (error) reject(error);
        else if (stats?.hasErrors()) reject(new Error(stats.toString({ all: false, errors: true })));
        else resolve();
      });
    });
  });
}

interface Served {
  buildDir: string;
  origin: string;
  close: () => Promise<void>;
}

/** One build and server for every project of the run (vitest calls a project's global setup once per project). */
let served: Promise<Served> | undefined;
let users = 0;

async function buildAndServe(): Promise<Served> {
  const buildDir = mkdtempSync(join(tmpdir(), 'plumbline-build-'));
  await build(buildDir);
  const running = await startServer(buildDir, 0, false);
  return {
    buildDir,
    origin: running.origin,
    close: async () => {
      await running.close();
      rmSync(buildDir, { recursive: true, force: true });
    },
  };
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  served ??= buildAndServe();
  users++;
  const { buildDir, origin } = await served;
  project.provide('previewOrigin', origin);
  project.provide('buildDir', buildDir);
  return async () => {
    users--;
    if (users > 0 || served === undefined) return;
    const last = served;
    served = undefined;
    await (await last).close();
  };
}
