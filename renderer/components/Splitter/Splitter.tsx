// A splitter between two panels (WAI-ARIA "window splitter"): role=separator with its value, moved
// by dragging or by the keyboard (arrows step 24 px, Shift+arrows 96 px, Home/End to the limits).
// The value is the size in pixels of the panel it controls; the owner clamps and keeps it.

import { useRef } from 'react';

export interface SplitterProps {
  /** 'horizontal': a bar between panels above and below; 'vertical': between left and right. */
  orientation: 'horizontal' | 'vertical';
  label: string;
  /** id of the panel whose size this sets. */
  controls: string;
  value: number;
  min: number;
  max: number;
  /** +1 when moving the bar down/right makes the controlled panel larger, -1 when smaller. */
  grows: 1 | -1;
  onChange(value: number): void;
}

const STEP = 24;

export function Splitter({ orientation, label, controls, value, min, max, grows, onChange }: SplitterProps) {
  const drag = useRef<{ start: number; value: number } | null>(null);
  const clamp = (v: number) => Math.round(Math.max(min, Math.min(max, v)));
  const along = (event: React.PointerEvent) => (orientation === 'horizontal' ? event.clientY : event.clientX);
  const onKeyDown = (event: React.KeyboardEvent) => {
    const back = orientation === 'horizontal' ? 'ArrowUp' : 'ArrowLeft';
    const forward = orientation === 'horizontal' ? 'ArrowDown' : 'ArrowRight';
    const step = event.shiftKey ? STEP * 4 : STEP;
    let next: number | null = null;
    if (event.key === back) next = value - grows * step;
    else if (event.key === forward) next = value + grows * step;
    else if (event.key === 'Home') next = min;
    else if (event.key === 'End') next = max;
    if (next === null) return;
    event.preventDefault();
    onChange(clamp(next));
  };
  return (
    <div
      className={`lw-splitter lw-splitter-${orientation}`}
      role="separator"
      tabIndex={0}
      aria-label={label}
      aria-controls={controls}
      // A horizontal bar separates panels stacked vertically (ARIA names the bar's own direction).
      aria-orientation={orientation}
      aria-valuenow={Math.round(value)}
      aria-valuemin={Math.round(min)}
      aria-valuemax={Math.round(max)}
      aria-valuetext={`${Math.round(value)} pixels`}
      onKeyDown={onKeyDown}
      onPointerDown={(event) => {
        event.currentTarget.setPointerCapture(event.pointerId);
        drag.current = { start: along(event), value };
      }}
      onPointerMove={(event) => {
        if (drag.current) onChange(clamp(drag.current.value + grows * (along(event) - drag.current.start)));
      }}
      onPointerUp={() => (drag.current = null)}
      onPointerCancel={() => (drag.current = null)}
    />
  );
}
