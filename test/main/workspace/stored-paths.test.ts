import { describe, expect, it } from 'vitest';
import path from 'node:path';
import { resolvedPath, storedPath, withResolvedPaths, withStoredPaths } from '../../../main/workspace/stored-paths';
import { emptyWorkspace } from '../../../engine/workspace/document';

describe('stored input paths (POSIX)', () => {
  const api = path.posix;
  it('stores files under the workspace folder relative, with "/"', () => {
    expect(storedPath('/srv/plan/data/lanes.csv', '/srv/plan/week9.json', api)).toBe('data/lanes.csv');
    expect(storedPath('/srv/plan/depots.csv', '/srv/plan/week9.json', api)).toBe('depots.csv');
  });
  it('keeps files outside the workspace folder absolute', () => {
    expect(storedPath('/srv/shared/lanes.csv', '/srv/plan/week9.json', api)).toBe('/srv/shared/lanes.csv');
  });
  it('resolves relative paths against the workspace folder, wherever it moved', () => {
    expect(resolvedPath('data/lanes.csv', '/home/ana/copy/week9.json', api)).toBe('/home/ana/copy/data/lanes.csv');
    expect(resolvedPath('/srv/shared/lanes.csv', '/home/ana/copy/week9.json', api)).toBe('/srv/shared/lanes.csv');
  });
});

describe('stored input paths (Windows)', () => {
  const api = path.win32;
  it('stores relative with "/" and resolves back with "\\"', () => {
    const stored = storedPath('C:\\Plans\\data\\lanes.csv', 'C:\\Plans\\week9.json', api);
    expect(stored).toBe('data/lanes.csv');
    expect(resolvedPath(stored, 'D:\\Copy\\week9.json', api)).toBe('D:\\Copy\\data\\lanes.csv');
  });
  it('keeps a file on another drive absolute', () => {
    expect(storedPath('E:\\lanes.csv', 'C:\\Plans\\week9.json', api)).toBe('E:\\lanes.csv');
  });
});

describe('names that are not paths', () => {
  it('keeps references such as the bundled sample untouched both ways, on both systems', () => {
    for (const api of [path.posix, path.win32]) {
      expect(storedPath('sample:lanes.csv', '/srv/plan/w.json', api)).toBe('sample:lanes.csv');
      expect(resolvedPath('sample:lanes.csv', '/srv/plan/w.json', api)).toBe('sample:lanes.csv');
    }
    // A drive-relative Windows path is still a path, not a reference.
    expect(resolvedPath('data/lanes.csv', 'C:\\Plans\\w.json', path.win32)).toBe('C:\\Plans\\data\\lanes.csv');
  });
});

describe('whole documents', () => {
  it('round-trips the files block and leaves null paths alone', () => {
    const doc = { ...emptyWorkspace(), files: { depots: '/srv/plan/depots.csv', lanes: null } };
    const stored = withStoredPaths(doc, '/srv/plan/w.json', path.posix);
    expect(stored.files).toEqual({ depots: 'depots.csv', lanes: null });
    expect(withResolvedPaths(stored, '/srv/plan/w.json', path.posix)).toEqual(doc);
  });

  it('stores the loads and vehicles files like the network files, and leaves them out when absent', () => {
    const doc = { ...emptyWorkspace(), files: { depots: '/srv/plan/depots.csv', lanes: null, loads: '/srv/plan/day/loads.csv', vehicles: '/fleet/vehicles.csv' } };
    const stored = withStoredPaths(doc, '/srv/plan/w.json', path.posix);
    expect(stored.files).toEqual({ depots: 'depots.csv', lanes: null, loads: 'day/loads.csv', vehicles: '/fleet/vehicles.csv' });
    expect(withResolvedPaths(stored, '/srv/plan/w.json', path.posix)).toEqual(doc);
    expect(Object.keys(withStoredPaths(emptyWorkspace(), '/srv/plan/w.json', path.posix).files)).toEqual(['depots', 'lanes']);
  });
});
