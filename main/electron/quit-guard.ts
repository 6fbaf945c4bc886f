// Unsaved changes are never lost silently: closing the window (or quitting the app) while the
// workspace is dirty asks Save / Discard / Cancel. Save asks the renderer, which owns the document,
// to save; the window closes only once that save succeeds. Electron comes in through callbacks.

import type { MenuCommand } from '../ipc/contract';

/** Buttons of the prompt, in the order they are shown. */
export const QUIT_PROMPT_BUTTONS = ['Save', 'Discard', 'Cancel'] as const;
const SAVE = 0;
const DISCARD = 1;

/** Options passed to dialog.showMessageBoxSync for the prompt. */
export const QUIT_PROMPT_OPTIONS = {
  type: 'warning' as const,
  buttons: [...QUIT_PROMPT_BUTTONS],
  defaultId: SAVE,
  cancelId: 2,
  noLink: true,
  title: 'Unsaved changes',
  message: 'This workspace has changes that are not saved.',
  detail: 'Save them before closing, discard them, or cancel and keep working.',
};

/** What the guard needs from the window and the app. */
export interface QuitGuardPort {
  /** Shows the prompt modally; returns the index of the button pressed. */
  showPrompt(options: typeof QUIT_PROMPT_OPTIONS): number;
  /** Sends a menu command to the renderer. */
  send(command: MenuCommand): void;
  /** Closes the window again (now allowed through). */
  closeWindow(): void;
  /** Marks the window as edited (macOS close button dot). */
  setEdited?(dirty: boolean): void;
}

/** Unsaved-changes state and the close decision. */
export class QuitGuard {
  private dirty = false;
  private closeAllowed = false;
  private closeAfterSave = false;

  constructor(private readonly port: QuitGuardPort) {}

  get isDirty(): boolean {
    return this.dirty;
  }

  /** The renderer reported whether there are unsaved changes. */
  setDirty(dirty: boolean): void {
    this.dirty = dirty;
    this.port.setEdited?.(dirty);
  }

  /**
   * Handler of the window's 'close' event. Lets the close through when nothing is unsaved or the
   * user already chose; otherwise prevents it and asks.
   */
  onClose(event: { preventDefault(): void }): void {
    if (!this.dirty || this.closeAllowed) return;
    event.preventDefault();
    if (this.closeAfterSave) return; // a save asked for by the prompt is still running
    const choice = this.port.showPrompt(QUIT_PROMPT_OPTIONS);
    if (choice === SAVE) {
      this.closeAfterSave = true;
      this.port.send({ command: 'save', thenQuit: true });
    } else if (choice === DISCARD) {
      this.closeAllowed = true;
      this.port.closeWindow();
    }
    // Cancel (or Escape): keep working.
  }

  /** A workspace save finished: the path written, or null when it was cancelled or failed. */
  onSaveFinished(path: string | null): void {
    if (!this.closeAfterSave) return;
    this.closeAfterSave = false;
    if (path === null) return; // the user cancelled the save dialog, or it failed: stay open
    this.dirty = false;
    this.closeAllowed = true;
    this.port.closeWindow();
  }
}
