// Sizes of the resizable panels (the lower panel's height, the side panel's width), kept in the
// browser's storage so the window opens as it was left, and clamped so the map, the banner and
// the panels each keep a usable size whatever the window does.

import { useCallback, useEffect, useState } from 'react';

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

function saved(): Partial<Layout> {
  try {
    const value: unknown = JSON.parse(localStorage.getItem(KEY) ?? 'null');
    if (typeof value !== 'object' || value === null) return {};
    const v = value as Record<string, unknown>;
    return {
      ...(typeof v.lowerPx === 'number' && Number.isFinite(v.lowerPx) ? { lowerPx: v.lowerPx } : {}),
      ...(typeof v.sidePx === 'number' && Number.isFinite(v.sidePx) ? { sidePx: v.sidePx } : {}),
    };
  } catch {
    return {};
  }
}

export function useLayout(): { layout: Layout; limits: LayoutLimits; setLowerPx(px: number): void; setSidePx(px: number): void } {
  const [limits, setLimits] = useState(() => limitsFor(window.innerWidth, window.innerHeight));
  const [layout, setLayout] = useState<Layout>(() => clampTo({ lowerPx: Math.round(window.innerHeight * 0.4), sidePx: 330, ...saved() }, limits));
  useEffect(() => {
    const onResize = () => setLimits(limitsFor(window.innerWidth, window.innerHeight));
    window.addEventListener('resize', onResize);
    return () => window.removeEventListener('resize', onResize);
  }, []);
  const shown = clampTo(layout, limits);
  const keep = useCallback((next: Layout) => {
    setLayout(next);
    try {
      localStorage.setItem(KEY, JSON.stringify(next));
    } catch {
      // Storage full or blocked: the sizes still apply for this session.
    }
  }, []);
  return {
    layout: shown,
    limits,
    setLowerPx: (px) => keep({ ...shown, lowerPx: px }),
    setSidePx: (px) => keep({ ...shown, sidePx: px }),
  };
}
