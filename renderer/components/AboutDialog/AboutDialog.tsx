// The about box: product, version, runtime and the cautions every dispatcher should keep in mind.

import { CAUTIONS, PRODUCT_NAME, PRODUCT_TAGLINE, SAMPLE_DATA_NOTICE } from '../../../engine/index';
import { Dialog } from '../Dialog/Dialog';

export interface AboutDialogProps {
  version: string;
  runtime: string;
  onClose(): void;
}

export function AboutDialog({ version, runtime, onClose }: AboutDialogProps) {
  return (
    <Dialog title={`About ${PRODUCT_NAME}`} onClose={onClose}>
      <p>
        <strong>
          {PRODUCT_NAME} {version}
        </strong>{' '}
        — {PRODUCT_TAGLINE}
      </p>
      <p className="lw-muted">Running in: {runtime}</p>
      <h3>Cautions</h3>
      <ul className="lw-cautions">
        {CAUTIONS.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      <p className="lw-muted">{SAMPLE_DATA_NOTICE}</p>
      <p className="lw-muted">Map data: land and borders from Natural Earth (public domain), drawn offline.</p>
      <div className="lw-dialog-buttons">
        <button type="button" onClick={onClose}>
          Close
        </button>
      </div>
    </Dialog>
  );
}
