// Contract review for the review tab: the engine's audit (every rebate loop in the whole contract,
// not only those reachable from the origin; the fix plan; rebate headroom per lane) of the network
// under the active scenario.

import { auditNetwork } from '../../engine/index';
import type { ImportResult, Network } from '../../engine/index';
import { auditReport, type AuditReport } from '../../engine/index';
import { overlayKeys, scenarioImport } from '../../engine/index';
import { hasChanges, type Scenario } from '../model/scenario-edits';

export type ContractReviewView = AuditReport & { scenarioProblems: string[] };

/** Audits the planned network, with the scenario laid over the import's lane rows first when it has changes. */
export function reviewContract(imported: ImportResult, network: Network, scenario: Scenario | null, onProgress?: (phase: string, fraction: number) => void): ContractReviewView {
  let target = network;
  let scenarioProblems: string[] = [];
  // Lane keys as scenarios name them (counted over the file's rows), for the fix plan's changes.
  const rowKeys = overlayKeys(imported);
  let laneKeys = Array.from(imported.plan.laneRecord, (r) => rowKeys[r]);
  if (scenario && hasChanges(scenario)) {
    const what = scenarioImport(imported, scenario);
    target = what.network;
    laneKeys = what.keys;
    scenarioProblems = what.overlay.problems.map((p) => p.message);
  }
  const phases = { loops: 'Finding rebate loops', 'fix-plan': 'Working out a fix plan', headroom: 'Rebate headroom per lane' } as const;
  const order = { loops: 0, 'fix-plan': 1, headroom: 2 } as const;
  const audit = auditNetwork(target, {
    laneKeys,
    onProgress: (p) => onProgress?.(phases[p.phase], (order[p.phase] + (p.total > 0 ? p.done / p.total : 0)) / 3),
  });
  return { ...auditReport(target, audit), scenarioProblems };
}
