// The worker's state and message handling, free of any worker global so unit tests drive it
// directly: the import result (re-planned when the day or vehicle class changes), the last solve
// (for routes and exports) and the base solve of the active scenario (for the comparison).

import { LanewrightError } from '../../engine/index';
import type { ImportResult, ReviewedFile } from '../../engine/index';
import type { Network } from '../../engine/index';
import { overlayIndex, type OverlayIndex } from '../../engine/index';
import { hasChanges, type Scenario } from '../model/scenario-edits';
import { exportText } from './exports';
import { currencyKey, importTexts, replanImport, reportOf } from './import-texts';
import { laneOfRows, networkView, transferablesOf } from './network-view';
import type { ContractReviewView, FromWorker, NamedText, PlanChoice, PlanSettings, SolveView, ToWorker } from './protocol';
import { reviewContract } from './review';
import { createAppHeadroomPool, type AppHeadroomPool } from './headroom-pool';
import { dispatchLoads } from './dispatch-loads';
import { withLaneDetails } from './lane-details';
import { DEFAULT_QUERY, queryDepots } from '../model/results-table';
import { onBaseLanes, rebuiltLanesOf, pathOf, routeChanges, scenarioSolveInput, solveFor, solveTransferables, solveView, type Solved } from './solve-plan';

export type Post = (message: FromWorker, transfer?: ArrayBuffer[]) => void;

export class WorkerSession {
  private imported: ImportResult | null = null;
  private network: Network | null = null;
  private plan: PlanChoice = { date: '', vehicleClass: '' };
  private solved: Solved | null = null;
  /** Id of the solve request `solved` answered. */
  private solvedId: number | null = null;
  private baseKey = '';
  private settings: PlanSettings | null = null;
  private scenario: Scenario | null = null;
  /** Set when the last solve ran on a network the scenario rebuilt; its lanes map back through laneRefs. */
  private solvedOn: { network: Network; laneRefs: Int32Array } | null = null;
  /** Base network lane of each lanes-file row (-1 = not planned), to map a rebuilt network back. */
  private laneOfRow: Int32Array = new Int32Array(0);
  /** Keys of the import's lane rows, counted once per import (occurrences over the whole file). */
  private rowIndex: OverlayIndex | null = null;
  /** The texts of the last accepted import: a new currency or rates means reading them again. */
  private texts: { depots: NamedText; lanes: NamedText } | null = null;
  private base: { solved: Solved; status: Uint8Array; cost: Float64Array; legs: Int32Array } | null = null;
  /** Names and SHA-256 of the texts last loaded, for the printable review (hashed as they arrive). */
  private files: ReviewedFile[] = [];
  /** Settles once the loaded files' SHA-256 (named in the review report) are known. */
  filesHashed: Promise<void> = Promise.resolve();
  private loads = 0;
  /** The contract review last made, for its CSV exports; a new import or plan drops it. */
  private reviewed: { scenario: Scenario | null; report: ContractReviewView } | null = null;

  /** `headroom`: the engine worker's headroom threads (engine.worker.ts); by default the calling thread alone. */
  constructor(
    private readonly post: Post,
    private readonly headroom: AppHeadroomPool = createAppHeadroomPool({ isolated: false, cores: 1, spawn: () => { throw new Error('no headroom workers here'); } }),
  ) {}

  handle(message: ToWorker): void {
    try {
      this.dispatch(message);
    } catch (error) {
      this.post({ kind: 'error', id: message.id, error: { name: error instanceof Error ? error.name : 'Error', message: error instanceof Error ? error.message : String(error) } });
    }
  }

  private dispatch(message: ToWorker): void {
    switch (message.kind) {
      case 'load':
        return this.load(message);
      case 'replan':
        return this.replan(message.id, message.plan);
      case 'solve':
        return this.solve(message.id, message.settings, message.scenario);
      case 'route': {
        const network = this.need();
        const on = this.solvedOn;
        // A newer solve may have run since the UI asked (one the UI then dropped as superseded): its
        // tree could give another path, which the UI would draw beside the old solve's costs.
        const current = this.solved && this.solvedId === message.solveId;
        const route = current ? pathOf(on ? on.network : network, this.solved!, message.target) : null;
        const onBase = route && on ? { ...route, lanes: route.lanes.map((e) => on.laneRefs[e]) } : route;
        this.post({ kind: 'route', id: message.id, route: withLaneDetails(this.imported, onBase) });
        return;
      }
      case 'export': {
        if (!this.imported) throw new LanewrightError('workspace: no network is loaded yet');
        const ctx = { imported: this.imported, network: this.need(), settings: this.settings, scenario: this.scenario, date: this.plan.date || null, vehicleClass: this.plan.vehicleClass || null, files: this.files.map((f) => f.name), review: this.reviewed };
        const file = exportText(ctx, message.what, message.dialect);
        this.post({ kind: 'exported', id: message.id, ...file });
        return;
      }
      case 'dispatch': {
        if (!this.imported || !this.network) throw new LanewrightError('workspace: no network is loaded yet');
        this.post({ kind: 'progress', id: message.id, phase: 'Planning the loads', fraction: 0.1 });
        this.post({ kind: 'dispatched', id: message.id, result: dispatchLoads(this.imported, message.request, this.rowIndex ?? undefined) });
        return;
      }
      case 'review': {
        const progress = (phase: string, fraction: number) => this.post({ kind: 'progress', id: message.id, phase, fraction });
        if (!this.imported) throw new LanewrightError('workspace: no network is loaded yet');
        const context = { imported: this.imported, files: this.files, fixBy: message.fixBy ?? 'lane' };
        const network = this.need();
        const measured = this.headroom.measure((runner) => reviewContract(this.imported!, network, message.scenario, progress, context, runner));
        const review = { ...measured.result, headroomThreads: measured.threads };
        this.reviewed = { scenario: message.scenario, report: review };
        this.post({ kind: 'reviewed', id: message.id, review });
        return;
      }
      default: {
        // Every request kind of WorkerRequests is handled above: a new kind fails to compile here.
        const unhandled: never = message;
        throw new LanewrightError(`worker: unknown request ${JSON.stringify(unhandled)}`);
      }
    }
  }

  private need(): Network {
    if (!this.network) throw new LanewrightError('workspace: no network is loaded yet');
    return this.network;
  }

  private adopt(id: number, result: ImportResult, plan: PlanChoice): void {
    this.imported = result;
    this.network = result.network;
    this.plan = plan;
    this.laneOfRow = laneOfRows(result);
    this.rowIndex = overlayIndex(result);
    this.solved = null;
    this.solvedId = null;
    this.base = null;
    this.baseKey = '';
    this.reviewed = null;
    // A review may follow: the headroom workers start now, while the user looks at the network.
    this.headroom.warm();
    const view = networkView(result, plan, this.rowIndex!.keys);
    this.post({ kind: 'loaded', id, network: view, report: reportOf(result) }, transferablesOf(view));
  }

  private load(message: Extract<ToWorker, { kind: 'load' }>): void {
    const progress = (phase: string, fraction: number) => this.post({ kind: 'progress', id: message.id, phase, fraction });
    progress('Reading depots and lanes', 0);
    const result = importTexts(message.depots, message.lanes, message.plan, progress);
    const report = reportOf(result);
    // With rejected rows the import waits for the user's choice; the network on screen stays.
    if (!result.network || (report.issues.length > 0 && !message.acceptPartial)) {
      this.post({ kind: 'loaded', id: message.id, network: null, report });
      return;
    }
    progress('Compiling the network', 0.95);
    this.files = [message.depots, message.lanes].map((f) => ({ name: f.name, sha256: 'computing…' }));
    const load = ++this.loads;
    this.filesHashed = hashTexts([message.depots, message.lanes]).then((files) => {
      if (load === this.loads) this.files = files;
    });
    this.texts = { depots: message.depots, lanes: message.lanes };
    this.adopt(message.id, result, message.plan);
  }

  private replan(id: number, plan: PlanChoice): void {
    if (!this.imported) throw new LanewrightError('workspace: no network is loaded yet');
    this.post({ kind: 'progress', id, phase: 'Planning for the day and vehicle class', fraction: 0.2 });
    const reread = this.texts !== null && currencyKey(plan) !== currencyKey(this.plan);
    const result = reread ? importTexts(this.texts!.depots, this.texts!.lanes, plan) : replanImport(this.imported, plan);
    if (!result.network) {
      this.post({ kind: 'loaded', id, network: null, report: reportOf(result) });
      return;
    }
    this.adopt(id, result, plan);
  }

  private solve(id: number, settings: PlanSettings, scenario: Scenario | null): void {
    const network = this.need();
    const driveLimit = this.imported?.plan.settings.drivingLimit.dailyDrivingMinutes ?? 9 * 60;
    this.post({ kind: 'progress', id, phase: 'Solving routes', fraction: 0.3 });
    const started = performance.now();
    this.settings = settings;
    this.scenario = scenario;
    this.solvedId = id;
    let view: SolveView;
    const input = scenarioSolveInput(this.imported!, network, scenario, this.rowIndex ?? undefined);
    if (input.rebuilt) {
      // The scenario changes which rows are planned (added lanes, validity, a class copy): the
      // engine plans the overlay's network, and the answer is mapped back onto the base lanes.
      const lanes = rebuiltLanesOf(input.rebuilt, this.laneOfRow, this.imported!, scenario!);
      const laneRefs = lanes.laneRefs;
      this.solved = solveFor(input.rebuilt.network, settings);
      this.solvedOn = { network: input.rebuilt.network, laneRefs };
      view = onBaseLanes(solveView(input.rebuilt.network, settings, this.solved, performance.now() - started, driveLimit, input.overlay), lanes);
    } else {
      this.solved = solveFor(network, settings, input.weights);
      this.solvedOn = null;
      view = solveView(network, settings, this.solved, performance.now() - started, driveLimit, input.overlay);
    }
    if (hasChanges(scenario)) {
      const key = JSON.stringify(settings);
      if (key !== this.baseKey || !this.base) {
        const base = solveFor(network, settings);
        this.base = { solved: base, status: base.status.slice(), cost: base.cost.slice(), legs: base.legs.slice() };
        this.baseKey = key;
      }
      const on = this.solvedOn;
      const routeChanged = routeChanges(network, this.base.solved, on ? on.network : network, this.solved, on ? on.laneRefs : null);
      view.base = { status: this.base.status.slice(), cost: this.base.cost.slice(), legs: this.base.legs.slice(), routeChanged };
    }
    view.tableOrder = queryDepots(network, view, DEFAULT_QUERY);
    this.post({ kind: 'solved', id, result: view }, solveTransferables(view));
  }
}

/** SHA-256 of each text as UTF-8 (the bytes of a UTF-8 file without a byte-order mark). */
async function hashTexts(texts: readonly { name: string; text: string }[]): Promise<ReviewedFile[]> {
  return Promise.all(
    texts.map(async ({ name, text }) => {
      const digest = new Uint8Array(await crypto.subtle.digest('SHA-256', new TextEncoder().encode(text)));
      return { name, sha256: Array.from(digest, (b) => b.toString(16).padStart(2, '0')).join('') };
    }),
  );
}
