// The tabbed lower panel: results table, editable lanes with the scenario comparison, the
// contract review and the last import's report.

import { parseScenarioDocument } from '../../engine/index';
import type { AddedLane } from '../model/added-lanes';
import type { Scenario } from '../model/scenario-edits';
import type { OverlayView } from '../worker/protocol';
import type { ExportChoice } from '../model/export-file';
import type { NetworkView, SolveView } from '../worker/protocol';
import { ContractReview } from '../components/ContractReview/ContractReview';
import { ImportReportTable } from '../components/ImportPanel/ImportReportTable';
import { LaneTable } from '../components/LaneTable/LaneTable';
import { LoadsPanel } from '../components/LoadsPanel/LoadsPanel';
import type { LoadRouteDrawing } from '../map/load-route-layer';
import { ResultsTable } from '../components/ResultsTable/ResultsTable';
import { ScenarioCompare } from '../components/ScenarioCompare/ScenarioCompare';
import { Tabs } from '../components/Tabs/Tabs';
import type { Workbench } from './use-workbench';

export interface LowerPanelProps {
  bench: Workbench;
  network: NetworkView;
  solve: SolveView;
  amounts: OverlayView;
  added: readonly AddedLane[];
  tab: string;
  onTab(tab: string): void;
  onExport(kind: ExportChoice): void;
  /** Routes of the load selected in the Loads panel, for the map. */
  onDrawLoad(routes: LoadRouteDrawing[] | null): void;
}

export function LowerPanel({ bench, network, solve, amounts, added, tab, onTab, onExport, onDrawLoad }: LowerPanelProps) {
  const { scenario, setScenario, selected, setSelected, dataset } = bench;
  const onScenario = (next: Scenario) => setScenario(next);
  // A scenario file replaces the what-if edits on screen: unsaved ones are asked about first.
  const loadScenarioFile = () =>
    bench.replaceWith('Loading a scenario file', async () => {
      const picked = await bench.host.pickFile('scenario');
      if (!picked.ok) return bench.setMessage(`Scenario not read: ${picked.failure.message}`);
      if (!picked.value) return;
      try {
        bench.scenarioFromFile(parseScenarioDocument(picked.value.text, picked.value.name));
        bench.setMessage(`Loaded scenario file ${picked.value.name}.`);
      } catch (error) {
        bench.setMessage(`Scenario not read: ${(error as Error).message}`);
      }
    });
  const issues = dataset.report?.issues.length ?? 0;
  const tabs = [
    { id: 'results', label: 'Results' },
    { id: 'lanes', label: 'Lanes & scenario', badge: scenario.changes.length ? `(${scenario.changes.length} changed)` : undefined },
    { id: 'review', label: 'Contract review', badge: solve.loops.length ? '(loop!)' : undefined },
    { id: 'import', label: 'Import report', badge: issues ? `(${issues} rejected)` : undefined },
    { id: 'loads', label: 'Loads' },
  ];
  return (
    <Tabs tabs={tabs} active={tab} onChange={onTab} label="Results and contract">
      {tab === 'results' && <ResultsTable network={network} solve={solve} selected={selected} onSelect={setSelected} onExport={() => onExport('routes-csv')} />}
      {tab === 'lanes' && (
        <div className="lw-split">
          <LaneTable network={network} amounts={amounts} added={added} scenario={scenario} onScenario={onScenario} />
          <ScenarioCompare network={network} solve={solve} scenario={scenario} onScenario={onScenario} onLoadFile={() => void loadScenarioFile()} onSaveFile={() => onExport('scenario-json')} onExport={() => onExport('compare-csv')} />
        </div>
      )}
      {tab === 'review' && (
        <ContractReview
          engine={bench.engine}
          network={network}
          scenario={scenario}
          onScenario={onScenario}
          host={bench.host}
          onMessage={bench.setMessage}
          onExport={onExport}
          onDate={(dispatchDate, vehicleClass) => bench.setSettings((now) => ({ ...now, dispatchDate, ...(vehicleClass === undefined ? {} : { vehicleClass: vehicleClass ?? '' }) }))}
        />
      )}
      {tab === 'import' && (dataset.report ? <ImportReportTable report={dataset.report} /> : <p>No import yet.</p>)}
      {/* Kept mounted while other tabs show, so the loads and their plan stay. */}
      <div hidden={tab !== 'loads'}>
        <LoadsPanel engine={bench.engine} host={bench.host} network={network} date={solve.settings.dispatchDate} scenario={scenario} files={bench.loadFiles} onFiles={bench.setLoadFiles} onDraw={onDrawLoad} onMessage={bench.setMessage} />
      </div>
    </Tabs>
  );
}
