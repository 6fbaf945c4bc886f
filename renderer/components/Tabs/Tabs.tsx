// Tabs for the lower panel (ARIA tabs pattern): Left/Right/Home/End move between tabs, only the
// active tab is in the Tab order, and its panel follows it.

import { useRef, type ReactNode } from 'react';

export interface TabSpec {
  id: string;
  label: string;
  /** Marker read after the label, e.g. a count of problems. */
  badge?: string;
}

export interface TabsProps {
  tabs: TabSpec[];
  active: string;
  onChange(id: string): void;
  children: ReactNode;
  label: string;
}

export function Tabs({ tabs, active, onChange, children, label }: TabsProps) {
  const list = useRef<HTMLDivElement>(null);
  const onKeyDown = (event: React.KeyboardEvent) => {
    const i = tabs.findIndex((t) => t.id === active);
    const next = event.key === 'ArrowRight' ? (i + 1) % tabs.length : event.key === 'ArrowLeft' ? (i - 1 + tabs.length) % tabs.length : event.key === 'Home' ? 0 : event.key === 'End' ? tabs.length - 1 : -1;
    if (next < 0) return;
    event.preventDefault();
    onChange(tabs[next].id);
    list.current?.querySelectorAll<HTMLElement>('[role="tab"]')[next]?.focus();
  };
  return (
    <div className="lw-tabs">
      <div role="tablist" aria-label={label} ref={list} onKeyDown={onKeyDown}>
        {tabs.map((t) => (
          <button key={t.id} type="button" role="tab" id={`tab-${t.id}`} aria-selected={t.id === active} aria-controls={`panel-${t.id}`} tabIndex={t.id === active ? 0 : -1} onClick={() => onChange(t.id)}>
            {t.label}
            {t.badge && <span className="lw-tab-badge"> {t.badge}</span>}
          </button>
        ))}
      </div>
      <div key={active} role="tabpanel" id={`panel-${active}`} aria-labelledby={`tab-${active}`} tabIndex={0} className="lw-tabpanel">
        {children}
      </div>
    </div>
  );
}
