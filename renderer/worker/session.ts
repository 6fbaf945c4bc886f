// The worker's state and message handling, free of any worker global so unit tests drive it
// directly: the imported network, the last solve (for routes and exports) and the base solve of
// the current scenario (for the comparison).

import { LanewrightError } from '../../engine/errors';
import { buildNetwork } from '../../engine/network/build';
import type { Network } from '../../engine/network/types';
import { hasChanges, type Scenario } from '../model/scenario-edits';
import { exportText } from './exports';
import { importTexts } from './import-texts';
import { networkView, transferablesOf } from './network-view';
import type { FromWorker, PlanSettings, ToWorker } from './protocol';
import { reviewContract } from './review';
import { pathOf, scenarioWeights, solveFor, solveView, type Solved } from './solve-plan';

export type Post = (message: FromWorker, transfer?: ArrayBuffer[]) => void;

export class WorkerSession {
  private network: Network | null = null;
  private solved: Solved | null = null;
  private weights: Float64Array | undefined;
  private baseKey = '';
  private base: { status: Uint8Array; cost: Float64Array; legs: Int32Array } | null = null;

  constructor(private readonly post: Post) {}

  handle(message: ToWorker): void {
    try {
      this.dispatch(message);
    } catch (error) {
      const known = error instanceof LanewrightError || error instanceof RangeError;
      this.post({
        kind: 'error',
        id: message.id,
        error: { name: error instanceof Error ? error.name : 'Error', message: known || error instanceof Error ? (error as Error).message : String(error) },
      });
    }
  }

  private dispatch(message: ToWorker): void {
    switch (message.kind) {
      case 'load':
        return this.load(message);
      case 'solve':
        return this.solve(message.id, message.settings, message.scenario);
      case 'route': {
        const network = this.need();
        this.post({ kind: 'route', id: message.id, route: this.solved ? pathOf(network, this.solved, message.target) : null });
        return;
      }
      case 'export': {
        const file = exportText(this.need(), this.solved, this.weights, message.what);
        this.post({ kind: 'exported', id: message.id, ...file });
        return;
      }
      case 'review':
        this.post({ kind: 'reviewed', id: message.id, review: reviewContract(this.need(), this.weights) });
        return;
    }
  }

  private need(): Network {
    if (!this.network) throw new LanewrightError('workspace: no network is loaded yet');
    return this.network;
  }

  private load(message: Extract<ToWorker, { kind: 'load' }>): void {
    this.post({ kind: 'progress', id: message.id, phase: 'Reading depots and lanes', fraction: 0.1 });
    const imported = importTexts(message.depots, message.lanes);
    const refuse = imported.report.fatal || (imported.report.issues.length > 0 && !message.acceptPartial);
    if (refuse) {
      this.post({ kind: 'loaded', id: message.id, network: null, report: imported.report });
      return;
    }
    this.post({ kind: 'progress', id: message.id, phase: 'Compiling the network', fraction: 0.6 });
    this.network = buildNetwork(imported.depots, imported.lanes);
    this.solved = null;
    this.base = null;
    this.baseKey = '';
    const view = networkView(this.network);
    this.post({ kind: 'loaded', id: message.id, network: view, report: imported.report }, transferablesOf(view));
  }

  private solve(id: number, settings: PlanSettings, scenario: Scenario | null): void {
    const network = this.need();
    this.post({ kind: 'progress', id, phase: 'Solving routes', fraction: 0.3 });
    const started = performance.now();
    this.weights = scenarioWeights(network, scenario);
    this.solved = solveFor(network, settings, this.weights);
    const solveMs = performance.now() - started;
    const view = solveView(network, settings, this.solved, solveMs);
    if (hasChanges(scenario)) {
      const key = JSON.stringify(settings);
      if (key !== this.baseKey || !this.base) {
        const base = solveFor(network, settings);
        this.base = { status: base.status.slice(), cost: base.cost.slice(), legs: base.legs.slice() };
        this.baseKey = key;
      }
      view.base = { status: this.base.status.slice(), cost: this.base.cost.slice(), legs: this.base.legs.slice() };
    }
    this.post({ kind: 'solved', id, result: view });
  }
}
