/**
 * The engine must stay pure TypeScript: nothing of Office, the DOM, the UI or Node, so that the
 * cell functions, the pane and outside tools all run the same numbers anywhere.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const engineDir = resolve(__dirname, '..', '..', 'src', 'engine');

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const path = join(dir, entry);
    return statSync(path).isDirectory() ? sourceFiles(path) : path.endsWith('.ts') ? [path] : [];
  });
}

describe('engine purity', () => {
  const files = sourceFiles(engineDir);

  it('has source files to check', () => {
    expect(files.length).toBeGreaterThan(5);
  });

  it.each(files.map((f) => [f.slice(engineDir.length + 1), f]))('%s imports only the engine and numeric packages', (_name, file) => {
    const text = readFileSync(file, 'utf8');
    const imports = [...text.matchAll(/from\s+'([^']+)'/g)].map((m) => m[1]);
    for (const spec of imports) expect(spec.startsWith('.') || spec.startsWith('@stdlib/')).toBe(true);
    expect(text).not.toMatch(/\b(Office|Excel|CustomFunctions|document|window)\./);
  });
});
