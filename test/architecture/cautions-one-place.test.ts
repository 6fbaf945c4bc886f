// The caution's words are written in one place, engine/text/cautions.ts: every surface (app, CLI,
// exports, printed sheets) imports them, so no screen can drift into its own wording or lose a part.

import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOTS = ['engine', 'main', 'renderer'];
const HOME = join('engine', 'text', 'cautions.ts');
// Phrases only the cautions use (the driving-limit flag's own caution words them differently).
const PHRASES = [/driver hours/i, /local regulations/i, /vehicle restrictions/i];

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const path = join(dir, e.name);
    if (e.isDirectory()) return e.name === 'node_modules' ? [] : sources(path);
    return /\.(ts|tsx|mjs|cjs|js|html|css)$/.test(e.name) ? [path] : [];
  });
}

describe('the caution text', () => {
  it('is written only in engine/text/cautions.ts', () => {
    const files = ROOTS.flatMap(sources);
    expect(files).toContain(HOME);
    const offenders = files.filter((f) => f !== HOME && PHRASES.some((p) => p.test(readFileSync(f, 'utf8'))));
    expect(offenders).toEqual([]);
  });
});
