// Keyboard for a windowed table: the table is one Tab stop (a roving tabindex), the arrows, Page
// Up/Down, Home and End move between rows by index (rows outside the rendered window are reached
// too: the window scrolls to the row, then focus follows), Enter or Space activates the row.

import { useEffect, useRef, useState } from 'react';
import type { RowWindow } from './use-row-window';

/** Rows a Page Up / Page Down moves. */
export const PAGE_ROWS = 15;

const STEPS: Readonly<Record<string, number>> = { ArrowDown: 1, ArrowUp: -1, PageDown: PAGE_ROWS, PageUp: -PAGE_ROWS, Home: -Infinity, End: Infinity };

export interface RowKeys {
  /** Index of the row that holds the Tab stop (tabIndex 0); every other row has -1. */
  tabStop: number;
  /** Call on a row's click and focus, so the Tab stop follows the mouse too. */
  setActive(index: number): void;
  onKeyDown(event: React.KeyboardEvent<HTMLTableRowElement>, index: number): void;
}

/** Rows carry `aria-rowindex = index + 2` (the header row is 1); `activate(index)` runs on Enter or Space. */
export function useRowKeys(rowWindow: RowWindow, count: number, activate: (index: number) => void): RowKeys {
  const [active, setActive] = useState(0);
  const focusWanted = useRef<number | null>(null);
  const last = count - 1;
  const current = Math.max(0, Math.min(active, last));
  const tabStop = current >= rowWindow.start && current < rowWindow.end ? current : rowWindow.start;

  // Focus follows the keys once the wanted row is rendered (a windowed table renders it after scrolling).
  useEffect(() => {
    const wanted = focusWanted.current;
    if (wanted === null) return;
    const row = rowWindow.bodyRef.current?.querySelector<HTMLElement>(`tr[aria-rowindex="${wanted + 2}"]`);
    if (row) {
      focusWanted.current = null;
      row.focus();
    }
  });

  const onKeyDown = (event: React.KeyboardEvent<HTMLTableRowElement>, index: number) => {
    if (event.key in STEPS) {
      event.preventDefault();
      const next = Math.max(0, Math.min(last, index + STEPS[event.key]));
      setActive(next);
      focusWanted.current = next;
      rowWindow.scrollToIndex(next);
    } else if (event.key === 'Enter' || event.key === ' ') {
      event.preventDefault();
      activate(index);
    }
  };
  return { tabStop, setActive, onKeyDown };
}
