// Export file names: what is inside, in a name every platform accepts. Reserved names and
// characters from Microsoft's "Naming Files, Paths, and Namespaces" (Win32 docs; list from memory).

import { describe, expect, it } from 'vitest';
import { exportFileName, safeNamePart } from '../../../engine/export/file-name';

describe('exportFileName', () => {
  it('carries kind, origin, date and class', () => {
    expect(exportFileName({ kind: 'routes', origin: 'RTM', date: '2026-08-15', vehicleClass: '2axle' }, 'csv')).toBe('routes-RTM-2026-08-15-2axle.csv');
    expect(exportFileName({ kind: 'routes', origin: 'RTM', date: '2026-08-15', vehicleClass: null }, 'csv')).toBe('routes-RTM-2026-08-15.csv');
  });

  it('keeps only characters every platform accepts', () => {
    const name = exportFileName({ kind: 'network', origin: 'Liège/Nord', date: '2026-08-15', scenario: 'Cap: "spring" <review>?*|\\' }, 'geojson');
    expect(name).toBe('network-Liege-Nord-2026-08-15-Cap-spring-review.geojson');
    expect(name).toMatch(/^[A-Za-z0-9._-]+$/);
  });

  it('never makes a Windows device name, an empty name or one ending in a dot', () => {
    expect(exportFileName({ kind: 'CON' }, 'csv')).toBe('_CON.csv');
    expect(exportFileName({ kind: 'lpt1' }, 'csv')).toBe('_lpt1.csv');
    expect(exportFileName({ kind: '///' }, 'csv')).toBe('export.csv');
    expect(safeNamePart('..hidden..')).toBe('hidden');
    expect(exportFileName({ kind: 'a'.repeat(300) }, 'csv').length).toBeLessThanOrEqual(124);
  });
});

describe('exportFileName and the desktop host', () => {
  it('any origin id (reserved characters, controls, device names, 400 characters) gives a name the host accepts', async () => {
    const { validateRequest } = await import('../../../main/ipc/validate-request');
    const fc = (await import('fast-check')).default;
    const unit = fc.oneof(fc.constantFrom(':', '/', '\\', '*', '?', '"', '<', '>', '|', '.', ' ', '\u0000', '\u007f', 'CON', 'nul'), fc.string({ minLength: 1, maxLength: 1 }), fc.string({ unit: 'grapheme', minLength: 1, maxLength: 1 }));
    fc.assert(
      fc.property(fc.string({ unit, maxLength: 400 }), (origin) => {
        const name = exportFileName({ kind: `routes-from-${origin}` }, 'csv');
        expect(validateRequest('file:save-export', { suggestedName: name, text: 'x', kind: 'csv' }).suggestedName).toBe(name);
        expect(name.length).toBeLessThanOrEqual(124);
      }),
      { numRuns: 1000, seed: 3 },
    );
  });
});
