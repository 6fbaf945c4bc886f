// Shared set-up for the host tests: a temp folder, scripted dialogs, real grants and recent list.
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { FileGrants } from '../../../main/electron/file-grants';
import { createHostService } from '../../../main/electron/host-service';
import type { NativeDialogs } from '../../../main/electron/native-dialogs';
import { RecentStore } from '../../../main/workspace/recent-list';
import type { RecentWorkspace } from '../../../main/ipc/contract';

export interface HostFixture {
  dir: string;
  dialogs: { [K in keyof NativeDialogs]: string | null };
  dialogCalls: string[];
  grants: FileGrants;
  recent: RecentStore;
  dirty: boolean[];
  saves: (string | null)[];
  recentChanges: RecentWorkspace[][];
  service: ReturnType<typeof createHostService>;
  write(name: string, text: string): Promise<string>;
  cleanup(): Promise<void>;
}

export async function hostFixture(): Promise<HostFixture> {
  const dir = await mkdtemp(join(tmpdir(), 'lw-host-'));
  const dialogs = { chooseWorkspaceToOpen: null, chooseWorkspaceTarget: null, chooseInputFile: null, chooseExportTarget: null } as HostFixture['dialogs'];
  const dialogCalls: string[] = [];
  const scripted: NativeDialogs = {
    chooseWorkspaceToOpen: async () => (dialogCalls.push('open'), dialogs.chooseWorkspaceToOpen),
    chooseWorkspaceTarget: async () => (dialogCalls.push('save-workspace'), dialogs.chooseWorkspaceTarget),
    chooseInputFile: async (kind) => (dialogCalls.push(`input:${kind}`), dialogs.chooseInputFile),
    chooseExportTarget: async (name, kind) => (dialogCalls.push(`export:${kind}:${name}`), dialogs.chooseExportTarget),
  };
  const grants = new FileGrants();
  const recent = new RecentStore(join(dir, 'recent-workspaces.json'));
  const fixture: HostFixture = {
    dir,
    dialogs,
    dialogCalls,
    grants,
    recent,
    dirty: [],
    saves: [],
    recentChanges: [],
    service: undefined as never,
    write: async (name, text) => {
      const file = join(dir, name);
      await writeFile(file, text);
      return file;
    },
    cleanup: () => rm(dir, { recursive: true, force: true }),
  };
  fixture.service = createHostService({
    dialogs: scripted,
    grants,
    recent,
    info: { name: 'Lanewright', version: '0.1.0', platform: 'linux', runtime: '41.7.1' },
    onDirtyChange: (d) => fixture.dirty.push(d),
    onSaveFinished: (p) => fixture.saves.push(p),
    onRecentChange: (e) => fixture.recentChanges.push(e),
    now: () => new Date('2026-03-02T08:00:00Z'),
  });
  return fixture;
}
