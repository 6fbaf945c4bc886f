// The loaded depots and lanes: importing a pair of files, the validation report, and the choice
// the report offers (fix the file, or continue with the accepted rows). A refused import never
// replaces the network already on screen.

import { useCallback, useRef, useState } from 'react';
import type { ImportReport, LoadRequest, NamedText, NetworkView, PlanChoice } from '../worker/protocol';
import { WorkCancelledError, type Engine } from './use-engine';

export interface DatasetFiles {
  depots: NamedText;
  lanes: NamedText;
}

/** An import waiting for the user's decision (its report lists rejected rows). */
export interface PendingImport {
  files: DatasetFiles;
  plan: PlanChoice;
  report: ImportReport;
}

export interface Dataset {
  files: DatasetFiles | null;
  network: NetworkView | null;
  /** Report of the import now on screen (rejected rows stay listed after continuing). */
  report: ImportReport | null;
  pending: PendingImport | null;
  error: string | null;
  /** True while an import (a file pair or a sample) runs in the engine. */
  importing: boolean;
  /** Imports files planned for `plan`; with issues the import waits in `pending` unless `acceptPartial`. Resolves true when loaded. */
  load(files: DatasetFiles, plan: PlanChoice, acceptPartial?: boolean): Promise<boolean>;
  /** Plans the loaded import for another day or vehicle class. */
  replan(plan: PlanChoice): Promise<boolean>;
  continueWithAccepted(): Promise<boolean>;
  dismissPending(): void;
}

export function useDataset(engine: Engine): Dataset {
  const [files, setFiles] = useState<DatasetFiles | null>(null);
  const [network, setNetwork] = useState<NetworkView | null>(null);
  const [report, setReport] = useState<ImportReport | null>(null);
  const [pending, setPending] = useState<PendingImport | null>(null);
  const [error, setError] = useState<string | null>(null);
  // A count, not a flag: a cancel replaces the worker while the cancelled load is still settling.
  const running = useRef(0);
  const [importing, setImporting] = useState(false);

  const load = useCallback(
    async (next: DatasetFiles, plan: PlanChoice, acceptPartial = false): Promise<boolean> => {
      setError(null);
      running.current++;
      setImporting(true);
      try {
        const request: LoadRequest = { depots: next.depots, lanes: next.lanes, acceptPartial, plan };
        const answer = await engine.track((onProgress) => engine.client.request('load', request, onProgress), 'Importing');
        if (!answer.network) {
          setPending({ files: next, plan, report: answer.report });
          return false;
        }
        engine.client.rememberLoad({ ...request, acceptPartial: true });
        setFiles(next);
        setNetwork(answer.network);
        setReport(answer.report);
        setPending(null);
        return true;
      } catch (caught) {
        if (!(caught instanceof WorkCancelledError)) setError((caught as Error).message);
        return false;
      } finally {
        running.current--;
        if (running.current === 0) setImporting(false);
      }
    },
    [engine],
  );

  const continueWithAccepted = useCallback(async () => (pending ? load(pending.files, pending.plan, true) : false), [load, pending]);


  const replan = useCallback(
    async (plan: PlanChoice): Promise<boolean> => {
      try {
        const answer = await engine.track((onProgress) => engine.client.request('replan', { plan }, onProgress), 'Planning');
        if (!answer.network) {
          setError(`The plan for ${plan.date}${plan.vehicleClass ? `, class ${plan.vehicleClass}` : ''} has errors: ${answer.report.issues[0]?.reason ?? 'no usable lanes'}`);
          return false;
        }
        engine.client.rememberPlan(plan);
        setNetwork(answer.network);
        setReport(answer.report);
        setError(null);
        return true;
      } catch (caught) {
        if (!(caught instanceof WorkCancelledError)) setError((caught as Error).message);
        return false;
      }
    },
    [engine],
  );
  const dismissPending = useCallback(() => setPending(null), []);

  return { files, network, report, pending, error, importing, load, replan, continueWithAccepted, dismissPending };
}
