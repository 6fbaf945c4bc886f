// Key to the map's symbols. Each entry pairs a drawn sample with words, since line width, dash
// pattern and marker shape (not colour alone) tell the states apart. It folds to one button, and
// starts folded on a small window, so it does not hide the network (or a loop's label).

import { useState } from 'react';

/** Below this window height or width the key starts folded. */
const SMALL_WINDOW = { width: 1200, height: 800 };

export function MapLegend() {
  const [open, setOpen] = useState(() => window.innerWidth >= SMALL_WINDOW.width && window.innerHeight >= SMALL_WINDOW.height);
  return (
    <div className="lw-legend-box">
      <button type="button" className="lw-legend-toggle" aria-expanded={open} aria-controls="lw-legend" onClick={() => setOpen(!open)}>
        Map key {open ? '▴' : '▾'}
      </button>
      {open && <MapKey />}
    </div>
  );
}

function MapKey() {
  return (
    <ul className="lw-legend" id="lw-legend" aria-label="Map key">
      <li>
        <svg width="28" height="10" aria-hidden="true">
          <line x1="0" y1="5" x2="28" y2="5" stroke="#8d9aa0" strokeWidth="1" />
        </svg>
        lane (two-way: two lines side by side)
      </li>
      <li>
        <svg width="28" height="10" aria-hidden="true">
          <line x1="0" y1="5" x2="28" y2="5" stroke="#1d5f86" strokeWidth="3" />
        </svg>
        cheapest-route tree
      </li>
      <li>
        <svg width="28" height="10" aria-hidden="true">
          <line x1="0" y1="5" x2="28" y2="5" stroke="#111" strokeWidth="7" />
          <line x1="0" y1="5" x2="28" y2="5" stroke="#f2b233" strokeWidth="4" />
        </svg>
        selected route
      </li>
      <li>
        <svg width="28" height="10" aria-hidden="true">
          <line x1="0" y1="5" x2="28" y2="5" stroke="#a3123a" strokeWidth="5" strokeDasharray="7 4" />
        </svg>
        rebate loop (labelled)
      </li>
      <li>
        <svg width="28" height="10" aria-hidden="true">
          <line x1="0" y1="5" x2="28" y2="5" stroke="#fff" strokeWidth="6" />
          <line x1="2" y1="5" x2="28" y2="5" stroke="#5b2a86" strokeWidth="4" strokeDasharray="0.1 8" strokeLinecap="round" />
        </svg>
        lane only the scenario plans (labelled)
      </li>
      <li>
        <span className="lw-legend-diamond" aria-hidden="true">
          ∞
        </span>
        unbounded depot
      </li>
      <li>
        <svg width="14" height="14" aria-hidden="true">
          <circle cx="7" cy="7" r="5" fill="#d0d4d6" stroke="#77858b" strokeDasharray="2 2" />
        </svg>
        unreachable depot
      </li>
    </ul>
  );
}
