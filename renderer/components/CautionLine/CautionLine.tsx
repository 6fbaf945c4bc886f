// The caution as one short line above anything that shows costs (results, comparison, review).
// The words come from engine/text/cautions.ts, the one place they are written.

import { REVIEW_CAUTION, ROUTE_CAUTION } from '../../../engine/index';

export function CautionLine({ kind = 'route', testId }: { kind?: 'route' | 'review'; testId: string }) {
  return (
    <p className="lw-caution-line" data-testid={testId}>
      <span aria-hidden="true">⚠ </span>
      {kind === 'review' ? REVIEW_CAUTION : ROUTE_CAUTION}
    </p>
  );
}
