import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { addRecent, MAX_RECENT, parseRecent, pruneMissing, RecentStore, serializeRecent } from '../../../main/workspace/recent-list';

const t = (minute: number) => new Date(Date.UTC(2026, 2, 2, 8, minute));

describe('recent list rules', () => {
  it('puts the latest first, keeps one entry per file, and holds at most ten', () => {
    let list = addRecent([], '/p/a.json', t(0));
    list = addRecent(list, '/p/b.json', t(1));
    list = addRecent(list, '/p/a.json', t(2));
    expect(list.map((e) => e.path)).toEqual(['/p/a.json', '/p/b.json']);
    expect(list[0]).toEqual({ path: '/p/a.json', name: 'a.json', openedAt: '2026-03-02T08:02:00.000Z' });
    for (let i = 0; i < 15; i++) list = addRecent(list, `/p/w${i}.json`, t(10 + i));
    expect(list).toHaveLength(MAX_RECENT);
    expect(list[0].path).toBe('/p/w14.json');
    expect(list.at(-1)!.path).toBe('/p/w5.json');
  });

  it('prunes files that no longer exist, keeping order', async () => {
    const list = ['/p/a', '/p/b', '/p/c'].reduce((l, p, i) => addRecent(l, p, t(i)), [] as ReturnType<typeof addRecent>);
    const pruned = await pruneMissing(list, async (p) => p !== '/p/b');
    expect(pruned.map((e) => e.path)).toEqual(['/p/c', '/p/a']);
  });

  it('reads back what it stores, and treats a damaged file as empty', () => {
    const list = addRecent([], '/p/a.json', t(0));
    expect(parseRecent(serializeRecent(list))).toEqual(list);
    expect(parseRecent('not json')).toEqual([]);
    expect(parseRecent('{"format":"lanewright-recent","version":1,"entries":[{"path":"relative.json","name":"x","openedAt":"2026-03-02T08:00:00Z"}]}')).toEqual([]);
    expect(parseRecent('{"format":"other","version":1,"entries":[]}')).toEqual([]);
  });
});

describe('RecentStore', () => {
  let dir: string;
  beforeEach(async () => {
    dir = await mkdtemp(join(tmpdir(), 'lw-recent-'));
  });
  afterEach(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it('persists across restarts and drops workspaces deleted meanwhile', async () => {
    const store = join(dir, 'recent-workspaces.json');
    const a = join(dir, 'a.json');
    const b = join(dir, 'b.json');
    await writeFile(a, '{}');
    await writeFile(b, '{}');
    const first = new RecentStore(store);
    expect(await first.load()).toEqual([]);
    await first.touch(a, t(0));
    await first.touch(b, t(1));
    expect(first.has(a)).toBe(true);
    await rm(b);
    const second = new RecentStore(store);
    expect((await second.load()).map((e) => e.path)).toEqual([a]);
    expect(second.has(b)).toBe(false);
    await second.forget(a);
    expect(JSON.parse(await readFile(store, 'utf8')).entries).toEqual([]);
    await second.touch(a, t(2));
    expect(await second.clear()).toEqual([]);
    expect(await new RecentStore(store).load()).toEqual([]);
  });
});
