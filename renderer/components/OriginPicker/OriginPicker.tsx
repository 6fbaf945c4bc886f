// Searchable origin list (an ARIA combobox): type part of an id or name, move with the arrow keys,
// Enter picks. Shows at most a page of matches so 5,000 depots stay quick.

import { useId, useMemo, useState } from 'react';
import { depotLabel } from '../../model/format';

export interface OriginPickerProps {
  ids: readonly string[];
  names: readonly string[];
  value: string;
  onChange(id: string): void;
}

const MAX_SHOWN = 50;

export function OriginPicker({ ids, names, value, onChange }: OriginPickerProps) {
  const [text, setText] = useState('');
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);
  const listId = useId();
  const matches = useMemo(() => {
    const needle = text.trim().toLowerCase();
    const out: number[] = [];
    for (let i = 0; i < ids.length && out.length < MAX_SHOWN; i++) {
      if (needle === '' || ids[i].toLowerCase().includes(needle) || names[i].toLowerCase().includes(needle)) out.push(i);
    }
    return out;
  }, [ids, names, text]);
  const current = ids.indexOf(value);
  const choose = (d: number) => {
    onChange(ids[d]);
    setText('');
    setOpen(false);
  };
  const onKeyDown = (event: React.KeyboardEvent<HTMLInputElement>) => {
    if (event.key === 'ArrowDown') {
      event.preventDefault();
      setOpen(true);
      setActive((a) => Math.min(a + 1, matches.length - 1));
    } else if (event.key === 'ArrowUp') {
      event.preventDefault();
      setActive((a) => Math.max(a - 1, 0));
    } else if (event.key === 'Enter' && open && matches[active] !== undefined) {
      event.preventDefault();
      choose(matches[active]);
    } else if (event.key === 'Escape') {
      setOpen(false);
    }
  };
  return (
    <div className="lw-origin-picker">
      <label htmlFor={`${listId}-input`}>Origin depot</label>
      <div className="lw-origin-current" aria-live="polite">
        {current >= 0 ? depotLabel(ids[current], names[current]) : 'none chosen'}
      </div>
      <input
        id={`${listId}-input`}
        type="search"
        role="combobox"
        aria-expanded={open}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={open && matches[active] !== undefined ? `${listId}-opt-${matches[active]}` : undefined}
        placeholder="Search depots by id or name"
        value={text}
        onChange={(event) => {
          setText(event.target.value);
          setOpen(true);
          setActive(0);
        }}
        onFocus={() => setOpen(true)}
        onBlur={() => setTimeout(() => setOpen(false), 150)}
        onKeyDown={onKeyDown}
      />
      {open && (
        <ul id={listId} role="listbox" aria-label="Matching depots" className="lw-listbox">
          {matches.map((d, i) => (
            <li
              key={d}
              id={`${listId}-opt-${d}`}
              role="option"
              aria-selected={i === active}
              className={i === active ? 'lw-active' : undefined}
              onMouseDown={(event) => {
                event.preventDefault();
                choose(d);
              }}
            >
              {depotLabel(ids[d], names[d])}
            </li>
          ))}
          {matches.length === 0 && <li className="lw-muted">No depot matches “{text}”.</li>}
        </ul>
      )}
    </div>
  );
}
