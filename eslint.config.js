// The project's import rules, checked by ESLint in `npm test` (`npm run lint`): which layer may use
// which, the order of the engine's areas, and the one wrapper module of each third-party library.
// DEVELOPERS.md ("Linting") says why the parser is Babel's and how to give a new engine area a place.

import babelParser from '@babel/eslint-parser';
import comments from '@eslint-community/eslint-plugin-eslint-comments';
import boundaries from 'eslint-plugin-boundaries';
import { builtinModules } from 'node:module';

/**
 * The engine's areas, lowest first. An area may import only areas before it in this list (and
 * itself); nothing in the engine imports engine/index.ts. Areas on one line share a rank and do not
 * import each other. A new folder under engine/ must be added here, or every import in it fails.
 */
const ENGINE_ORDER = [
  // text below errors: error messages show file values through text/shown-text.ts.
  ['text'],
  ['errors'],
  ['money', 'io', 'geo', 'json'],
  ['network'],
  ['import'],
  ['planning'],
  ['routes'],
  ['loops'],
  ['audit', 'dispatch'],
  ['scenario'],
  ['workspace'],
  ['report'],
  ['export'],
];

/** Each third-party library and the only files that may import it (globs, repository-relative). */
// `packages` are regular expressions for package names; their subpaths are covered too.
const WRAPPERS = [
  { packages: ['papaparse'], files: ['engine/io/csv-papaparse.ts'] },
  { packages: ['@turf/[^/]+'], files: ['engine/geo/turf.ts'] },
  { packages: ['zod'], files: ['engine/json/zod-checker.ts'] },
  { packages: ['leaflet', 'world-atlas', 'topojson-client'], files: ['renderer/map/**'] },
  { packages: ['electron'], files: ['main/electron/**', 'main/preload/**'] },
  { packages: ['esbuild'], files: ['main/build/**'] },
  { packages: ['react', 'react-dom'], files: ['renderer/**'] },
];

const nodeBuiltins = [...new Set(builtinModules.map((m) => m.split('/')[0]))];

/** Whether glob `outer` (a file or a `folder/**` glob) covers every file `inner` names. */
const covers = (outer, inner) => (outer.endsWith('/**') ? inner.startsWith(outer.slice(0, -2)) : outer === inner);

/** `no-restricted-imports` options forbidding every wrapped library except those `glob` may use. */
function restrictedFor(glob, extraPatterns = []) {
  const patterns = WRAPPERS.filter((w) => !w.files.some((f) => covers(f, glob))).map((w) => ({
    regex: `^(${w.packages.join('|')})(/.*)?$`,
    message: `only ${w.files.join(', ')} may import this library (one wrapper module per library).`,
  }));
  return ['error', { patterns: [...patterns, ...extraPatterns] }];
}

const noNodeBuiltins = (where) => ({
  regex: `^(node:.*|(${nodeBuiltins.map((n) => n.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')).join('|')})(/.*)?)$`,
  message: `${where} runs without Node: no Node built-in modules.`,
});

const engineAreaNames = ENGINE_ORDER.flat();
const below = (area) => ENGINE_ORDER.slice(0, ENGINE_ORDER.findIndex((rank) => rank.includes(area))).flat();

const boundaryPolicies = [
  // Engine areas import only lower areas; the engine never imports main/, renderer/ or its own index.
  ...engineAreaNames.map((area) => ({
    from: { element: { type: 'engine-area', captured: { area } } },
    allow: { to: { element: { type: 'engine-area', captured: { area: [area, ...below(area)] } } } },
    message: `engine/${area} may import only ${[area, ...below(area)].map((a) => `engine/${a}`).join(', ')} (the order in eslint.config.js ENGINE_ORDER).`,
  })),
  { from: { element: { type: 'engine-index' } }, allow: { to: { element: { type: 'engine-area' } } } },
  // main/ and renderer/ reach the engine through engine/index.ts only, never its internals.
  { from: { element: { type: ['main', 'ipc-contract'] } }, allow: { to: { element: { type: ['main', 'ipc-contract', 'engine-index'] } } } },
  { from: { element: { type: 'renderer' } }, allow: { to: { element: { type: ['renderer', 'engine-index'] } } } },
  // The renderer knows main only by the IPC contract's types: `import type` from main/ipc/contract.ts.
  { from: { element: { type: 'renderer' } }, allow: { to: { element: { type: 'ipc-contract' } }, dependency: { kind: 'type' } } },
];

const tsFiles = ['engine/**/*.ts', 'main/**/*.ts', 'renderer/**/*.ts', 'test/**/*.ts', '*.ts', '*.js'];

export default [
  { ignores: ['dist/**', 'build/**', 'node_modules/**', 'test-output/**', '**/*.d.ts', 'main/cli/lanewright.mjs'] },
  {
    files: tsFiles,
    languageOptions: {
      parser: babelParser,
      parserOptions: { requireConfigFile: false, babelOptions: { babelrc: false, configFile: false, parserOpts: { plugins: ['typescript'] } } },
    },
  },
  {
    files: [...tsFiles, '**/*.tsx'],
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    plugins: { '@eslint-community/eslint-comments': comments },
    rules: {
      // A rule switched off in a file must say why: `// eslint-disable-next-line rule -- reason`.
      '@eslint-community/eslint-comments/require-description': ['error', { ignore: [] }],
      '@eslint-community/eslint-comments/no-unlimited-disable': 'error',
      '@eslint-community/eslint-comments/disable-enable-pair': 'error',
    },
  },
  {
    files: ['engine/**/*.ts', 'main/**/*.ts', 'main/**/*.tsx', 'renderer/**/*.ts', 'renderer/**/*.tsx'],
    rules: {
      // A few core rules that hold for TypeScript parsed without types (no false alarms on types).
      'no-control-regex': 'error',
      'no-debugger': 'error',
      'no-dupe-keys': 'error',
      'no-duplicate-case': 'error',
      'no-self-compare': 'error',
      'no-unreachable': 'error',
      'no-unsafe-finally': 'error',
    },
  },
  {
    files: ['**/*.tsx'],
    languageOptions: {
      parser: babelParser,
      parserOptions: { requireConfigFile: false, babelOptions: { babelrc: false, configFile: false, parserOpts: { plugins: ['typescript', 'jsx'] } } },
    },
  },
  {
    files: ['engine/**/*.ts', 'main/**/*.ts', 'main/**/*.tsx', 'renderer/**/*.ts', 'renderer/**/*.tsx'],
    plugins: { boundaries },
    settings: {
      'import/resolver': { node: { extensions: ['.ts', '.tsx', '.js', '.mjs'] } },
      'boundaries/include': ['engine/**', 'main/**', 'renderer/**'],
      'boundaries/elements': [
        { type: 'engine-index', pattern: 'engine/index.ts', mode: 'full' },
        { type: 'engine-area', pattern: 'engine/*.ts', mode: 'full', capture: ['area'] },
        { type: 'engine-area', pattern: 'engine/*', capture: ['area'] },
        { type: 'ipc-contract', pattern: 'main/ipc/contract.ts', mode: 'full' },
        { type: 'main', pattern: 'main' },
        { type: 'renderer', pattern: 'renderer' },
      ],
    },
    rules: {
      'boundaries/dependencies': ['error', { default: 'disallow', policies: boundaryPolicies }],
      'boundaries/no-unknown-files': 'error',
    },
  },
  // Per-file library rules: each file may import only the libraries whose wrapper it is.
  ...['engine', 'main', 'renderer'].map((layer) => ({
    files: [`${layer}/**/*.ts`, `${layer}/**/*.tsx`],
    rules: { 'no-restricted-imports': restrictedFor('', layer === 'main' ? [] : [noNodeBuiltins(layer)]) },
  })),
  // Narrower globs come later, so they win for the files they name.
  ...WRAPPERS.flatMap((w) => w.files).sort((a, b) => a.length - b.length).map((file) => ({
    files: [file],
    rules: { 'no-restricted-imports': restrictedFor(file, file.startsWith('main/') ? [] : [noNodeBuiltins(file.split('/')[0])]) },
  })),
];
