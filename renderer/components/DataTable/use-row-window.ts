// Row windowing for long tables: only the rows in (or near) the scrolled view are in the DOM, with
// spacer rows standing in for the rest, so 5,000 depots cost a few dozen rows of layout per update.
// Short tables render every row (their text stays searchable and printable as is).

import { useCallback, useEffect, useLayoutEffect, useRef, useState } from 'react';

/** Tables with at least this many rows are windowed. */
export const WINDOW_FROM_ROWS = 400;
const OVERSCAN_ROWS = 8;
// Rows rendered before the first measure (a lower panel shows about twenty).
const INITIAL_ROWS = 32;
const DEFAULT_ROW_PX = 26;

export interface RowWindow {
  /** Attach to the table's tbody. */
  bodyRef: React.RefObject<HTMLTableSectionElement | null>;
  windowed: boolean;
  /** Rendered rows are [start, end). */
  start: number;
  end: number;
  /** Height of one row (px), measured from a rendered row. */
  rowPx: number;
  /** Heights of the spacer rows before and after the rendered rows (px). */
  padTop: number;
  padBottom: number;
  /** Scrolls the nearest scrolling ancestor so row `index` is in view (its element may render a frame later). */
  scrollToIndex(index: number): void;
}

function scrollParent(element: HTMLElement): HTMLElement {
  for (let e = element.parentElement; e; e = e.parentElement) {
    const overflow = getComputedStyle(e).overflowY;
    if (overflow === 'auto' || overflow === 'scroll') return e;
  }
  return document.documentElement;
}

/** Window over `count` rows of the tbody at `bodyRef`; re-measured on scroll and resize. */
export function useRowWindow(count: number): RowWindow {
  const bodyRef = useRef<HTMLTableSectionElement | null>(null);
  const windowed = count >= WINDOW_FROM_ROWS;
  const rowPx = useRef(DEFAULT_ROW_PX);
  const [range, setRange] = useState({ start: 0, end: Math.min(count, windowed ? INITIAL_ROWS : count) });

  // The scrolling ancestor, found once per body (getComputedStyle up the tree on every scroll
  // event recalculated style each time).
  const scrollerRef = useRef<{ body: HTMLElement; scroller: HTMLElement } | null>(null);
  const scrollerOf = (body: HTMLElement): HTMLElement => {
    if (scrollerRef.current?.body !== body) scrollerRef.current = { body, scroller: scrollParent(body) };
    return scrollerRef.current.scroller;
  };

  const measure = useCallback(() => {
    const body = bodyRef.current;
    if (!body || !windowed) return;
    const row = body.querySelector<HTMLElement>('tr[aria-rowindex]');
    if (row && row.offsetHeight > 0) rowPx.current = row.offsetHeight;
    const scroller = scrollerOf(body);
    const bodyTop = body.getBoundingClientRect().top - scroller.getBoundingClientRect().top + scroller.scrollTop;
    const first = Math.floor((scroller.scrollTop - bodyTop) / rowPx.current);
    const shown = Math.ceil(scroller.clientHeight / rowPx.current);
    const start = Math.max(0, Math.min(count, first) - OVERSCAN_ROWS);
    const end = Math.min(count, Math.max(0, first) + shown + OVERSCAN_ROWS);
    setRange((r) => (r.start === start && r.end === end ? r : { start, end }));
  }, [count, windowed]);

  // Measured in the next animation frame, not in the commit: reading sizes right after React
  // changed the rows forced style and layout of the whole page inside the click or solve that
  // caused it (a long task); in the frame they are computed once, as the frame needs them anyway.
  useLayoutEffect(() => {
    const frame = requestAnimationFrame(measure);
    return () => cancelAnimationFrame(frame);
  }, [measure]);
  useEffect(() => {
    const body = bodyRef.current;
    if (!body || !windowed) return;
    const scroller = scrollerOf(body);
    const target: HTMLElement | Window = scroller === document.documentElement ? window : scroller;
    target.addEventListener('scroll', measure, { passive: true });
    const resize = new ResizeObserver(measure);
    resize.observe(scroller);
    return () => {
      target.removeEventListener('scroll', measure);
      resize.disconnect();
    };
  }, [measure, windowed]);

  const scrollToIndex = useCallback(
    (index: number) => {
      const body = bodyRef.current;
      if (!body || !windowed) return;
      const scroller = scrollerOf(body);
      const head = body.parentElement?.querySelector('thead')?.getBoundingClientRect().height ?? 0;
      const bodyTop = body.getBoundingClientRect().top - scroller.getBoundingClientRect().top + scroller.scrollTop;
      const rowTop = bodyTop + index * rowPx.current;
      // The header sticks to the top of the scroller, so a row counts as visible only below it.
      if (rowTop - head < scroller.scrollTop) scroller.scrollTop = rowTop - head;
      else if (rowTop + rowPx.current > scroller.scrollTop + scroller.clientHeight) scroller.scrollTop = rowTop + rowPx.current - scroller.clientHeight;
      measure();
    },
    [measure, windowed],
  );

  const start = windowed ? Math.min(range.start, count) : 0;
  const end = windowed ? Math.min(Math.max(range.end, start), count) : count;
  return { bodyRef, windowed, start, end, rowPx: rowPx.current, padTop: start * rowPx.current, padBottom: (count - end) * rowPx.current, scrollToIndex };
}
