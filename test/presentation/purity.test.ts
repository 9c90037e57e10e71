/**
 * The presentation module words the engine's results for every surface, so it imports only the
 * engine and itself: no Office, DOM, UI, cell grids or pane code (the direction DEVELOPERS.md
 * gives for dependencies). And the engine holds no wording: the reading functions and the
 * p-value format are not among its exports.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import * as engine from '../../src/engine';

const presentationDir = resolve(__dirname, '..', '..', 'src', 'presentation');
const files = readdirSync(presentationDir).filter((f) => f.endsWith('.ts'));

describe('presentation purity', () => {
  it('has source files to check', () => {
    expect(files.length).toBeGreaterThan(3);
  });

  it.each(files)('%s imports only the engine and the presentation module', (file) => {
    const text = readFileSync(join(presentationDir, file), 'utf8');
    const imports = [...text.matchAll(/from\s+'([^']+)'/g)].map((m) => m[1]);
    for (const spec of imports) expect(spec === '../engine' || spec.startsWith('./')).toBe(true);
    expect(text).not.toMatch(/\b(Office|Excel|CustomFunctions|document|window)\./);
  });

  it('the engine exports no reading texts or number formats', () => {
    for (const name of ['formatP', 'unusualRowsReading', 'conditionReading', 'COLLINEARITY_REASON_TEXT', 'LARGE_VIF']) {
      expect(Object.keys(engine)).not.toContain(name);
    }
  });
});
