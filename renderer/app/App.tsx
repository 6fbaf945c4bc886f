// The window's layout: header, planning side panel, the map, the tabbed lower panel and the status
// line. State lives in the workbench hook; this file only arranges components.

import { useEffect, useMemo, useRef, useState } from 'react';
import type { LanewrightHost } from '../../main/ipc/contract';
import { ErrorBoundary } from '../components/ErrorBoundary/ErrorBoundary';
import { AboutDialog } from '../components/AboutDialog/AboutDialog';
import { FirstRunNotice } from '../components/FirstRunNotice/FirstRunNotice';
import { DiscardPrompt } from '../components/DiscardPrompt/DiscardPrompt';
import { ImportDialog } from '../components/ImportPanel/ImportDialog';
import { LoopAlert } from '../components/LoopAlert/LoopAlert';
import { MapLegend } from '../components/MapLegend/MapLegend';
import { PlanControls } from '../components/PlanControls/PlanControls';
import { PlanningSettings } from '../components/PlanningSettings/PlanningSettings';
import { ProgressBar } from '../components/ProgressBar/ProgressBar';
import { RouteDetail } from '../components/RouteDetail/RouteDetail';
import { Splitter } from '../components/Splitter/Splitter';
import { StatusBar } from '../components/StatusBar/StatusBar';
import { TopBar } from '../components/TopBar/TopBar';
import { NetworkMap } from '../map/NetworkMap';
import { sameAddedLanes, type AddedLane } from '../model/added-lanes';
import { hasChanges } from '../model/scenario-edits';
import type { LoadRouteDrawing } from '../map/load-route-layer';
import { LowerPanel } from './LowerPanel';
import { useCommands } from './use-commands';
import { useWorkbench } from './use-workbench';

export function App({ host, version }: { host: LanewrightHost; version: string }) {
  const bench = useWorkbench(host);
  const { dataset, plan, settings, setSettings, scenario, selected, setSelected } = bench;
  const network = dataset.network;
  const [importOpen, setImportOpen] = useState(false);
  const [aboutOpen, setAboutOpen] = useState(false);
  const [tab, setTab] = useState('results');
  // The Loads panel's selected load (and its alternatives), drawn on the map while that tab is open.
  const [loadRoutes, setLoadRoutes] = useState<LoadRouteDrawing[] | null>(null);
  // Importing replaces the scenario, so unsaved changes are asked about before the import dialog opens.
  const { replaceWith } = bench;
  const ui = useMemo(() => ({ openImport: () => void replaceWith('Importing CSV files', () => setImportOpen(true)), openAbout: () => setAboutOpen(true) }), [replaceWith]);
  const { exportFile } = useCommands(bench, ui);
  const { layout, limits, setLowerPx, setSidePx } = bench.panels;


  // A newly imported network without the chosen origin starts from its first depot.
  useEffect(() => {
    if (network && network.depotIds.length > 0 && !network.depotIds.includes(settings.origin)) setSettings({ ...settings, origin: network.depotIds[0] });
  }, [network, settings, setSettings]);

  const planFrom = (d: number) => {
    if (!network) return;
    setSettings({ ...settings, origin: network.depotIds[d] });
    setSelected(null);
  };
  const solve = plan.solve && network && plan.solvedFor === network ? plan.solve : null;
  // Lanes only the scenario plans come with each solve (the engine's overlay, in the worker). A solve
  // that lists the same ones keeps the same list, so the map does not redraw layers built on it.
  const addedRef = useRef<AddedLane[]>([]);
  const extraLanes = solve?.extraLanes;
  const added = useMemo(() => {
    const next = extraLanes ?? [];
    if (!sameAddedLanes(next, addedRef.current)) addedRef.current = next;
    return addedRef.current;
  }, [extraLanes]);
  const route = solve ? plan.route : null;
  // Amounts under the scenario and lane keys come from the engine's overlay in the worker.
  const amounts = solve?.overlay ?? null;
  // The import dialog shows the progress bar itself (inside the modal, in its keyboard cycle).
  const importShown = importOpen || dataset.pending !== null;
  const datasetName = dataset.files ? `${dataset.files.depots.name} + ${dataset.files.lanes.name}` : 'nothing loaded';
  return (
    <div
      className="lw-app"
      data-ready={solve && !plan.solving ? 'yes' : 'no'}
      data-solves={plan.solveCount}
      style={{ '--lw-lower-px': `${layout.lowerPx}px`, '--lw-side-px': `${layout.sidePx}px` } as React.CSSProperties}
    >
      <a className="lw-skip" href="#lw-lower">
        Skip to results
      </a>
      <TopBar datasetName={datasetName} desktop={host.kind === 'desktop'} dirty={bench.dirty} importing={dataset.importing} onSample={(loop) => void bench.openSample(loop)} onImport={ui.openImport} onSave={() => void bench.save(false)} onExport={(k) => void exportFile(k)} onAbout={ui.openAbout} />
      {!importShown && <ProgressBar progress={bench.progress} onCancel={bench.engine.cancel} />}
      {(dataset.error || plan.error) && (
        <p className="lw-error" role="alert">
          {dataset.error ?? plan.error}
        </p>
      )}
      {network && solve && amounts && <LoopAlert network={network} solve={solve} amounts={amounts} added={added} onReview={() => setTab('review')} />}
      <main className="lw-body">
        <aside className="lw-side" id="lw-side" aria-label="Plan and route">
          {network && <PlanControls network={network} settings={settings} onChange={setSettings} />}
          {network && <PlanningSettings choices={settings.planning} onChange={(planning) => setSettings({ ...settings, planning })} />}
          {network && solve && amounts && selected !== null && selected < network.depotIds.length && (
            <RouteDetail network={network} solve={solve} amounts={amounts} depot={selected} route={route} added={added} onPlanFrom={planFrom} scenarioName={hasChanges(scenario) ? scenario.name : null} host={host} onMessage={bench.setMessage} />
          )}
          {network && solve && selected === null && <p className="lw-muted">Click a depot on the map or a row in the results for its route and cost breakdown; double-click a depot on the map to plan from it.</p>}
        </aside>
        <Splitter orientation="vertical" label="Width of the plan and route panel" controls="lw-side" value={layout.sidePx} min={limits.side.min} max={limits.side.max} grows={1} onChange={setSidePx} />
        <section className="lw-mapwrap" aria-label="Map">
          <ErrorBoundary what="map">
            <NetworkMap network={network} solve={solve} route={route} added={added} selected={selected} onSelect={setSelected} onPlanFrom={planFrom} loadRoutes={tab === 'loads' ? loadRoutes : null} legend={<MapLegend />} />
          </ErrorBoundary>
        </section>
      </main>
      <Splitter orientation="horizontal" label="Height of the results panel" controls="lw-lower" value={layout.lowerPx} min={limits.lower.min} max={limits.lower.max} grows={-1} onChange={setLowerPx} />
      <section id="lw-lower" className="lw-lower" aria-label="Results and contract">
        <ErrorBoundary what="results panel">
          {network && solve && <LowerPanel bench={bench} network={network} solve={solve} amounts={solve.overlay} added={added} tab={tab} onTab={setTab} onExport={exportFile} onDrawLoad={setLoadRoutes} />}
        </ErrorBoundary>
      </section>
      <StatusBar network={network} solve={solve} roundTripMs={plan.roundTripMs} solving={plan.solving} message={bench.message} />
      <FirstRunNotice />
      {aboutOpen && <AboutDialog version={version} runtime={host.kind === 'desktop' ? 'desktop app' : 'browser'} onClose={() => setAboutOpen(false)} />}
      {importShown && (
        <ImportDialog
          host={host}
          current={dataset.files}
          pending={dataset.pending}
          onImport={bench.importFiles}
          onContinue={bench.continueImport}
          onFix={dataset.dismissPending}
          onClose={() => setImportOpen(false)}
          progress={bench.progress}
          onCancelWork={bench.engine.cancel}
          importing={dataset.importing}
        />
      )}
      {bench.discardPrompt && <DiscardPrompt action={bench.discardPrompt.action} onAnswer={bench.answerDiscard} browser={host.kind === 'web'} />}
    </div>
  );
}
