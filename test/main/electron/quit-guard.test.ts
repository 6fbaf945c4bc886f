import { describe, expect, it, vi } from 'vitest';
import { QuitGuard, QUIT_PROMPT_BUTTONS, QUIT_PROMPT_OPTIONS } from '../../../main/electron/quit-guard';
import type { MenuCommand } from '../../../main/ipc/contract';

function setup(answer: number) {
  const sent: MenuCommand[] = [];
  const port = { showPrompt: vi.fn(() => answer), send: (c: MenuCommand) => sent.push(c), closeWindow: vi.fn(), setEdited: vi.fn() };
  const guard = new QuitGuard(port);
  const close = () => {
    const event = { preventDefault: vi.fn() };
    guard.onClose(event);
    return event.preventDefault.mock.calls.length > 0;
  };
  return { guard, port, sent, close };
}

describe('QuitGuard', () => {
  it('lets a clean window close without asking', () => {
    const { port, close } = setup(0);
    expect(close()).toBe(false);
    expect(port.showPrompt).not.toHaveBeenCalled();
  });

  it('asks Save / Discard / Cancel with Save as default and Cancel on Escape', () => {
    expect(QUIT_PROMPT_OPTIONS.buttons).toEqual([...QUIT_PROMPT_BUTTONS]);
    expect(QUIT_PROMPT_BUTTONS).toEqual(['Save', 'Discard', 'Cancel']);
    expect(QUIT_PROMPT_OPTIONS.defaultId).toBe(0);
    expect(QUIT_PROMPT_OPTIONS.cancelId).toBe(2);
  });

  it('Cancel keeps the window open and the changes', () => {
    const { guard, port, close } = setup(2);
    guard.setDirty(true);
    expect(close()).toBe(true);
    expect(port.closeWindow).not.toHaveBeenCalled();
    expect(guard.isDirty).toBe(true);
  });

  it('Discard closes, and the second close goes through without asking again', () => {
    const { guard, port, close } = setup(1);
    guard.setDirty(true);
    expect(close()).toBe(true);
    expect(port.closeWindow).toHaveBeenCalledOnce();
    expect(close()).toBe(false);
    expect(port.showPrompt).toHaveBeenCalledOnce();
  });

  it('Save asks the renderer to save, and closes only after the save succeeds', () => {
    const { guard, port, sent, close } = setup(0);
    guard.setDirty(true);
    expect(close()).toBe(true);
    expect(sent).toEqual([{ command: 'save', thenQuit: true }]);
    expect(close()).toBe(true); // a second close while saving neither asks nor closes
    expect(port.showPrompt).toHaveBeenCalledOnce();
    guard.onSaveFinished('/plans/w.json');
    expect(port.closeWindow).toHaveBeenCalledOnce();
    expect(close()).toBe(false);
  });

  it('a cancelled or failed save keeps the window open and asks again next time', () => {
    const { guard, port, close } = setup(0);
    guard.setDirty(true);
    close();
    guard.onSaveFinished(null);
    expect(port.closeWindow).not.toHaveBeenCalled();
    expect(close()).toBe(true);
    expect(port.showPrompt).toHaveBeenCalledTimes(2);
  });

  it('ignores ordinary saves (not started by the prompt) and marks the window edited', () => {
    const { guard, port } = setup(0);
    guard.setDirty(true);
    guard.onSaveFinished('/plans/w.json');
    expect(port.closeWindow).not.toHaveBeenCalled();
    expect(port.setEdited).toHaveBeenCalledWith(true);
  });
});
