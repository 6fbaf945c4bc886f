// Sizes of the resizable panels (the lower panel's height, the side panel's width). They belong to
// the workspace (saved in its `layout`, reopened with it); the browser's storage keeps the last
// sizes too, as the starting point of a window whose workspace names none (the sample, a file saved
// before version 3). Shown sizes are clamped so the map, the banner and the panels each keep a usable
// size whatever the window does.

import { useCallback, useEffect, useState } from 'react';
import type { WorkspaceLayout } from '../../engine/index';

const KEY = 'lanewright.layout';

/** Smallest sizes in pixels: below these a panel shows too little to work with. */
export const LAYOUT_MIN = { lower: 150, map: 180, side: 260, mapWidth: 320 };
// Top bar, banner (folded) and status line together, at most; the rest is the map and the panel.
const CHROME_PX = 170;

export interface Layout {
  lowerPx: number;
  sidePx: number;
}

export interface LayoutLimits {
  lower: { min: number; max: number };
  side: { min: number; max: number };
}

function limitsFor(width: number, height: number): LayoutLimits {
  return {
    lower: { min: LAYOUT_MIN.lower, max: Math.max(LAYOUT_MIN.lower, height - CHROME_PX - LAYOUT_MIN.map) },
    side: { min: LAYOUT_MIN.side, max: Math.max(LAYOUT_MIN.side, Math.min(560, width - LAYOUT_MIN.mapWidth)) },
  };
}

function clampTo(layout: Layout, limits: LayoutLimits): Layout {
  const clamp = (v: number, r: { min: number; max: number }) => Math.max(r.min, Math.min(r.max, v));
  return { lowerPx: clamp(layout.lowerPx, limits.lower), sidePx: clamp(layout.sidePx, limits.side) };
}

const size = (v: unknown): number | null => (typeof v === 'number' && Number.isSafeInteger(v) && v >= 0 ? v : null);

function saved(): WorkspaceLayout {
  try {
    const value: unknown = JSON.parse(localStorage.getItem(KEY) ?? 'null');
    if (typeof value !== 'object' || value === null) return { lowerPx: null, sidePx: null };
    const v = value as Record<string, unknown>;
    return { lowerPx: size(v.lowerPx), sidePx: size(v.sidePx) };
  } catch {
    return { lowerPx: null, sidePx: null };
  }
}

export interface LayoutState {
  /** The sizes shown, clamped to the window. */
  layout: Layout;
  limits: LayoutLimits;
  /** The sizes the dispatcher chose (null = the default), as the workspace keeps them. */
  chosen: WorkspaceLayout;
  setLowerPx(px: number): void;
  setSidePx(px: number): void;
  /** Applies a workspace's sizes; a null size keeps the one the window has. */
  restore(sizes: WorkspaceLayout): void;
}

export function useLayout(): LayoutState {
  const [limits, setLimits] = useState(() => limitsFor(window.innerWidth, window.innerHeight));
  const [chosen, setChosen] = useState<WorkspaceLayout>(saved);
  useEffect(() => {
    const onResize = () => setLimits(limitsFor(window.innerWidth, window.innerHeight));
    window.addEventListener('resize', onResize);
    return () => window.removeEventListener('resize', onResize);
  }, []);
  const shown = clampTo({ lowerPx: chosen.lowerPx ?? Math.round(window.innerHeight * 0.4), sidePx: chosen.sidePx ?? 330 }, limits);
  // What the dispatcher chose is kept unclamped, so a workspace saved on a small window keeps its sizes.
  const keep = useCallback((next: WorkspaceLayout) => {
    setChosen(next);
    try {
      localStorage.setItem(KEY, JSON.stringify(next));
    } catch {
      // Storage full or blocked: the sizes still apply for this session.
    }
  }, []);
  const restore = useCallback(
    (sizes: WorkspaceLayout) => setChosen((now) => {
      const next = { lowerPx: sizes.lowerPx ?? now.lowerPx, sidePx: sizes.sidePx ?? now.sidePx };
      return next.lowerPx === now.lowerPx && next.sidePx === now.sidePx ? now : next;
    }),
    [],
  );
  return {
    layout: shown,
    limits,
    chosen,
    setLowerPx: (px) => keep({ ...chosen, lowerPx: Math.round(px) }),
    setSidePx: (px) => keep({ ...chosen, sidePx: Math.round(px) }),
    restore,
  };
}
