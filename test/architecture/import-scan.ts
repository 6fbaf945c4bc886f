// Reads the import statements of TypeScript sources without a compiler: comments are dropped
// (strings kept), then static, side-effect, re-export, dynamic and require() imports are matched.
// The layer rules in layers.test.ts run on what this finds.

import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';

export interface ImportFound {
  /** Specifier as written, e.g. "../engine/errors" or "leaflet". */
  specifier: string;
  /** `import type ...` / `export type ... from`: erased at compile time. */
  typeOnly: boolean;
  /** 1-based line of the statement. */
  line: number;
}

/** Source text with comments blanked out (newlines kept, so line numbers still hold). */
export function stripComments(source: string): string {
  let out = '';
  let i = 0;
  while (i < source.length) {
    const c = source[i];
    const next = source[i + 1];
    if (c === '/' && next === '/') {
      while (i < source.length && source[i] !== '\n') i++;
    } else if (c === '/' && next === '*') {
      const end = source.indexOf('*/', i + 2);
      const stop = end === -1 ? source.length : end + 2;
      out += source.slice(i, stop).replace(/[^\n]/g, ' ');
      i = stop;
    } else if (c === "'" || c === '"' || c === '`') {
      // Quotes end at their closing mark; ' and " never run past the line, which bounds the damage
      // a quote inside a regular expression literal could do.
      let j = i + 1;
      while (j < source.length && source[j] !== c && !(c !== '`' && source[j] === '\n')) j += source[j] === '\\' ? 2 : 1;
      out += source.slice(i, j + 1);
      i = j + 1;
    } else {
      out += c;
      i++;
    }
  }
  return out;
}

const STATIC = /(?:^|[^\w$.])(import|export)(\s+type)?\s+([^;'"`=]*?)\s*from\s*(['"])([^'"\n]+)\4/g;
const BARE = /(?:^|[^\w$.])import\s*(['"])([^'"\n]+)\1/g;
const CALL = /(?:^|[^\w$.])(?:import|require)\s*\(\s*(['"])([^'"\n]+)\1\s*\)/g;

/** Every import of one source text. */
export function findImports(source: string): ImportFound[] {
  const text = stripComments(source);
  const lineAt = (index: number) => text.slice(0, index).split('\n').length;
  const found: ImportFound[] = [];
  for (const m of text.matchAll(STATIC)) {
    // `export { a }` without `from` never reaches here; `export const x = ... from "y"` cannot occur.
    found.push({ specifier: m[5], typeOnly: m[2] !== undefined, line: lineAt(m.index! + m[0].indexOf(m[1])) });
  }
  for (const m of text.matchAll(BARE)) found.push({ specifier: m[2], typeOnly: false, line: lineAt(m.index! + m[0].indexOf('import')) });
  for (const m of text.matchAll(CALL)) found.push({ specifier: m[2], typeOnly: false, line: lineAt(m.index!) });
  return found;
}

/** .ts and .tsx files under `folder` (repository-relative, forward slashes), skipping build output. */
export function sourceFiles(root: string, folder: string): string[] {
  const files: string[] = [];
  const walk = (dir: string) => {
    let entries: string[];
    try {
      entries = readdirSync(dir);
    } catch {
      return;
    }
    for (const name of entries) {
      if (name === 'node_modules' || name === 'dist' || name === 'out' || name.startsWith('.')) continue;
      const path = join(dir, name);
      if (statSync(path).isDirectory()) walk(path);
      else if (/\.(ts|tsx|mts|cts)$/.test(name)) files.push(relative(root, path).split(sep).join('/'));
    }
  };
  walk(join(root, folder));
  return files.sort();
}

export const readSource = (root: string, file: string) => readFileSync(join(root, file), 'utf8');
