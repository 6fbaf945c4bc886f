// The layer rules of DEVELOPERS.md, checked on every import of every source file: dependencies
// point renderer -> engine and main -> engine only, and each third-party library is reached
// through its one wrapper. A failure names the file, line and import.

import { builtinModules } from 'node:module';
import { dirname, posix } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { findImports, readSource, sourceFiles, stripComments, type ImportFound } from './import-scan';

const root = fileURLToPath(new URL('../../', import.meta.url));
const LAYERS = ['engine', 'main', 'renderer'] as const;
type Layer = (typeof LAYERS)[number];

interface Edge extends ImportFound {
  file: string;
  layer: Layer;
  /** Repository path the import resolves to (relative specifiers), or null for a package. */
  target: string | null;
  /** Package name for bare specifiers ("react" for "react/jsx-runtime", "@turf/turf"). */
  pkg: string | null;
}

const builtins = new Set(builtinModules.flatMap((m) => [m, m.split('/')[0]]));
const isNodeBuiltin = (specifier: string) => specifier.startsWith('node:') || builtins.has(specifier) || builtins.has(specifier.split('/')[0]);
const packageOf = (specifier: string) => (specifier.startsWith('@') ? specifier.split('/').slice(0, 2).join('/') : specifier.split('/')[0]);

function edgesOf(layer: Layer): Edge[] {
  return sourceFiles(root, layer).flatMap((file) =>
    findImports(readSource(root, file)).map((found) => {
      const relativeImport = found.specifier.startsWith('.');
      return {
        ...found,
        file,
        layer,
        target: relativeImport ? posix.normalize(posix.join(dirname(file), found.specifier)) : null,
        pkg: relativeImport ? null : packageOf(found.specifier),
      };
    }),
  );
}

const edges = LAYERS.flatMap(edgesOf);
const describeEdge = (e: Edge) => `${e.file}:${e.line} imports "${e.specifier}"`;
const inFolder = (path: string, folder: string) => path === folder || path.startsWith(folder + '/');

/** The broken rules of one import (empty when it is fine). */
function violations(e: Edge): string[] {
  const broken: string[] = [];
  if (e.layer === 'engine') {
    if (e.target !== null && !inFolder(e.target, 'engine')) broken.push('engine reaches outside engine/');
    if (e.pkg !== null) {
      const wrapper = e.pkg === 'papaparse' ? 'engine/io/csv-papaparse.ts' : e.pkg === '@turf/turf' ? 'engine/geo/turf.ts' : null;
      if (wrapper === null) broken.push(`engine imports package "${e.pkg}"`);
      else if (e.file !== wrapper) broken.push(`${e.pkg} only through ${wrapper}`);
    }
  }
  if (e.layer === 'main' && e.target !== null && inFolder(e.target, 'renderer')) broken.push('main imports renderer');
  if (e.layer === 'renderer' && e.target !== null && inFolder(e.target, 'main')) {
    if (!(e.typeOnly && inFolder(e.target, 'main/ipc'))) broken.push('renderer reaches main other than `import type` from main/ipc/');
  }
  if (e.pkg === 'leaflet' && !e.file.startsWith('renderer/map/')) broken.push('leaflet outside renderer/map/');
  if (e.pkg === 'electron' && e.layer !== 'main') broken.push('electron outside main/');
  if ((e.pkg === 'react' || e.pkg === 'react-dom') && e.layer !== 'renderer') broken.push('react outside renderer/');
  if ((e.layer === 'engine' || e.layer === 'renderer') && e.pkg !== null && isNodeBuiltin(e.specifier)) broken.push(`Node builtin in ${e.layer}`);
  return broken;
}

describe('layer rules', () => {
  it('scans a real source tree', () => {
    expect(sourceFiles(root, 'engine').length).toBeGreaterThan(10);
    expect(edges.filter((e) => e.layer === 'engine').length).toBeGreaterThan(20);
  });

  it('every import in engine/, main/ and renderer/ keeps the rules', () => {
    const problems = edges.flatMap((e) => violations(e).map((why) => `${describeEdge(e)}: ${why}`));
    expect(problems).toEqual([]);
  });
});

describe('the rule checker itself', () => {
  const edge = (file: string, specifier: string, typeOnly = false): Edge => {
    const layer = file.split('/')[0] as Layer;
    const rel = specifier.startsWith('.');
    return { file, layer, specifier, typeOnly, line: 1, target: rel ? posix.normalize(posix.join(dirname(file), specifier)) : null, pkg: rel ? null : packageOf(specifier) };
  };

  it('flags each kind of forbidden import', () => {
    const bad = [
      edge('engine/routes/x.ts', '../../main/cli/run'),
      edge('engine/routes/x.ts', 'papaparse'),
      edge('engine/geo/other.ts', '@turf/turf'),
      edge('engine/routes/x.ts', 'graphlib'),
      edge('engine/routes/x.ts', 'node:fs'),
      edge('engine/routes/x.ts', 'path'),
      edge('main/electron/window.ts', '../../renderer/app/App'),
      edge('renderer/app/App.tsx', '../../main/ipc/contract'),
      edge('renderer/app/App.tsx', '../../main/cli/run', true),
      edge('renderer/app/App.tsx', 'leaflet'),
      edge('main/electron/window.ts', 'react'),
      edge('engine/x.ts', 'react-dom/client'),
      edge('renderer/app/App.tsx', 'electron'),
      edge('renderer/worker/w.ts', 'node:worker_threads'),
    ];
    for (const e of bad) expect(violations(e), describeEdge(e)).not.toEqual([]);
  });

  it('allows the wrappers, type-only IPC imports and engine use', () => {
    const good = [
      edge('engine/io/csv-papaparse.ts', 'papaparse'),
      edge('engine/geo/turf.ts', '@turf/turf'),
      edge('renderer/app/App.tsx', '../../main/ipc/contract', true),
      edge('renderer/map/view.ts', 'leaflet'),
      edge('renderer/app/App.tsx', 'react/jsx-runtime'),
      edge('main/electron/window.ts', 'electron'),
      edge('main/cli/run.ts', 'node:fs'),
      edge('main/cli/run.ts', '../../engine/errors'),
      edge('renderer/app/App.tsx', '../../engine/index'),
    ];
    for (const e of good) expect(violations(e), describeEdge(e)).toEqual([]);
  });

  it('finds static, multi-line, type-only, side-effect, re-export and dynamic imports, not commented ones', () => {
    const source = [
      "import { a,", // line 1
      "  b } from './ab';",
      "import type { C } from '../c';",
      "import 'side-effect';",
      "export * from './again';",
      "export type { D } from './d';",
      "const e = await import('./lazy');",
      "// import { nope } from 'commented';",
      "/* import { nope2 } from 'block' */",
      "const url = 'http://example.org'; import f from \"f-lib\";",
    ].join('\n');
    const found = findImports(source).map((f) => [f.specifier, f.typeOnly, f.line]);
    expect(found).toEqual(
      expect.arrayContaining([
        ['./ab', false, 1], ['../c', true, 3], ['side-effect', false, 4], ['./again', false, 5],
        ['./d', true, 6], ['./lazy', false, 7], ['f-lib', false, 10],
      ]),
    );
    expect(found.map((f) => f[0])).not.toContain('commented');
    expect(found.map((f) => f[0])).not.toContain('block');
    expect(stripComments('a // b\nc')).toBe('a \nc');
  });
});
