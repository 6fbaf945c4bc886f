// The first-run notice: shown once per installation (remembered in local storage) before the
// first plan is used, with every caution. The about box repeats them any time.

import { useState } from 'react';
import { CAUTIONS, FIRST_RUN_ACKNOWLEDGE, FIRST_RUN_LEAD, FIRST_RUN_TITLE, SAMPLE_DATA_NOTICE } from '../../../engine/index';
import { Dialog } from '../Dialog/Dialog';

export const FIRST_RUN_KEY = 'lanewright.firstRunAcknowledged';

function seen(): boolean {
  try {
    return localStorage.getItem(FIRST_RUN_KEY) === '1';
  } catch {
    return false;
  }
}

export function FirstRunNotice() {
  const [open, setOpen] = useState(() => !seen());
  if (!open) return null;
  const acknowledge = () => {
    try {
      localStorage.setItem(FIRST_RUN_KEY, '1');
    } catch {
      // storage refused: the notice shows again next time, which is the safe side
    }
    setOpen(false);
  };
  return (
    <Dialog title={FIRST_RUN_TITLE} onClose={acknowledge} requireButton>
      <p>{FIRST_RUN_LEAD}</p>
      <ul className="lw-cautions">
        {CAUTIONS.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      <p className="lw-muted">{SAMPLE_DATA_NOTICE}</p>
      <div className="lw-dialog-buttons">
        <button type="button" className="lw-primary" onClick={acknowledge}>
          {FIRST_RUN_ACKNOWLEDGE}
        </button>
      </div>
    </Dialog>
  );
}
