// Smoke test that the engine is pure: engine/index.ts is bundled with esbuild and run in a bare
// node:vm context with no process, require, module, window or document, and a solve there must
// give the published answer. Any stray Node or DOM use fails here even if the types let it pass.

import { buildSync } from 'esbuild';
import { createContext, runInContext } from 'node:vm';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const entry = fileURLToPath(new URL('../../engine/index.ts', import.meta.url));

describe('engine purity', () => {
  // platform 'browser': the engine's strictest host is a Web Worker, so packages resolve to their
  // browser builds (papaparse's Node build lazily requires 'stream', which no worker has).
  const bundle = buildSync({ entryPoints: [entry], bundle: true, format: 'iife', globalName: 'LanewrightEngine', platform: 'browser', write: false, logLevel: 'silent' });
  const code = bundle.outputFiles[0].text;

  it('loads in a context with no Node or browser globals', () => {
    const context = createContext({});
    expect(runInContext('[typeof process, typeof require, typeof module, typeof window, typeof document, typeof Buffer].join()', context)).toBe(
      'undefined,undefined,undefined,undefined,undefined,undefined',
    );
    runInContext(code, context, { filename: 'engine-bundle.js' });
    expect(runInContext('typeof LanewrightEngine.cheapestRoutes', context)).toBe('function');
  });

  it('solves cheapest routes inside that context', () => {
    const context = createContext({});
    runInContext(code, context);
    // Cormen, Leiserson, Rivest, Stein, "Introduction to Algorithms", 3rd edition, Figure 24.4
    // (values from memory): from s, t = 2, x = 4, y = 7, z = -2.
    const answer = runInContext(
      `(() => {
        const E = LanewrightEngine;
        const ids = ['s', 't', 'x', 'y', 'z'];
        const raw = [['s','t','6'],['s','y','7'],['t','x','5'],['t','y','8'],['t','z','-4'],['x','t','-2'],['y','x','-3'],['y','z','9'],['z','s','2'],['z','x','7']];
        const lanes = raw.map(([from, to, net], i) => ({
          from, to, toll: net.startsWith('-') ? E.ZERO : E.parseMinor(net), fuel: E.ZERO, fees: E.ZERO,
          rebate: net.startsWith('-') ? E.parseMinor(net.slice(1)) : E.ZERO, sourceRow: i + 2,
        }));
        const net = E.buildNetwork(ids.map((id) => ({ id, name: id, lat: 0, lon: 0 })), lanes);
        const tree = E.cheapestRoutes(net, 0);
        const path = E.routePath(net, tree, 4).depots.map((d) => ids[d]).join('>');
        return JSON.stringify({ cost: Array.from(tree.cost), loops: tree.loops.length, path });
      })()`,
      context,
    );
    // Amounts are read as major units, so 6 is 600 minor units.
    expect(JSON.parse(answer)).toEqual({ cost: [0, 200, 400, 700, -200], loops: 0, path: 's>y>x>t>z' });
  });
});
