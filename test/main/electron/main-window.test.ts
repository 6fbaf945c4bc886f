import { describe, expect, it, vi } from 'vitest';
import type { BrowserWindowConstructorOptions } from 'electron';
import { createMainWindow, type WindowConstructor } from '../../../main/electron/main-window';
import { APP_PAGE_URL } from '../../../main/electron/app-page';

function fakeWindowClass() {
  const instances: FakeWindow[] = [];
  class FakeWindow {
    handlers: Record<string, (...a: any[]) => void> = {};
    contentsHandlers: Record<string, (...a: any[]) => void> = {};
    loaded: string | null = null;
    shown = false;
    webContents = { on: (name: string, l: (...a: any[]) => void) => (this.contentsHandlers[name] = l) };
    constructor(readonly options: BrowserWindowConstructorOptions) {
      instances.push(this);
    }
    once(name: string, l: () => void) {
      this.handlers[name] = l;
    }
    on(name: string, l: (...a: any[]) => void) {
      this.handlers[name] = l;
    }
    show() {
      this.shown = true;
    }
    loadURL(url: string) {
      this.loaded = url;
      return Promise.resolve();
    }
  }
  return { Window: FakeWindow as unknown as WindowConstructor, instances };
}

describe('main window', () => {
  const guard = { onClose: vi.fn() };
  const onPageGone = vi.fn();
  const { Window, instances } = fakeWindowClass();
  createMainWindow(Window, { preloadPath: '/app/dist/main/preload.cjs', iconPath: '/app/build/icon.png', allowDevTools: false, guard, onPageGone });
  const win = instances[0];

  it('is created hidden with the secure preferences and the preload', () => {
    expect(win.options.show).toBe(false);
    expect(win.options.icon).toBe('/app/build/icon.png');
    expect(win.options.webPreferences).toMatchObject({ preload: '/app/dist/main/preload.cjs', contextIsolation: true, sandbox: true, nodeIntegration: false, devTools: false });
  });

  it('loads the app page and shows when ready', () => {
    expect(win.loaded).toBe(APP_PAGE_URL);
    expect(win.shown).toBe(false);
    win.handlers['ready-to-show']();
    expect(win.shown).toBe(true);
  });

  it('routes close through the unsaved-changes guard', () => {
    const event = { preventDefault: vi.fn() };
    win.handlers.close(event);
    expect(guard.onClose).toHaveBeenCalledWith(event);
  });

  it('reports a crashed page but not a clean exit', () => {
    win.contentsHandlers['render-process-gone']({}, { reason: 'crashed', exitCode: 1 });
    win.contentsHandlers['render-process-gone']({}, { reason: 'clean-exit', exitCode: 0 });
    expect(onPageGone.mock.calls).toEqual([['crashed']]);
  });
});
