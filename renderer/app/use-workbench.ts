// The window's state in one place for the shell to hand out: host, engine, loaded data, planning
// controls, the active scenario, the selection, and opening / saving the workspace. Whether the
// workspace is clean, dirty, saving, importing or being replaced is one state machine
// (model/workspace-lifecycle.ts); callbacks read it from its store, not from refs that mirror it.

import { useCallback, useEffect, useMemo, useRef, useState, useSyncExternalStore } from 'react';
import type { LanewrightHost } from '../../main/ipc/contract';
import { samePlanningChoices, serializeScenarioDocument, workspaceFingerprint } from '../../engine/index';
import { scenarioFileName } from '../model/export-file';
import { emptyScenario, hasChanges, type Scenario } from '../model/scenario-edits';
import { isDirty, LifecycleStore } from '../model/workspace-lifecycle';
import { SAMPLE_DATE, SAMPLE_ORIGIN, sampleFiles } from '../sample/sample';
import type { PlanChoice, PlanSettings } from '../worker/protocol';
import { useDataset, type DatasetFiles } from './use-dataset';
import { useDiscardGuard } from './use-discard-guard';
import { useEngine } from './use-engine';
import { useLayout } from './use-layout';
import { usePlan } from './use-plan';
import { defaultSettings, documentOf, filesOf, loadFilesOf, stateOf, type LoadFiles } from './workspace-doc';

function planOf(settings: PlanSettings): PlanChoice {
  return { date: settings.dispatchDate, vehicleClass: settings.vehicleClass, planning: settings.planning };
}

export function useWorkbench(host: LanewrightHost) {
  const { engine, progress, generation } = useEngine();
  const dataset = useDataset(engine);
  // The dataset object is new every render; its functions are stable, so callbacks depend on them.
  const { load, replan } = dataset;
  const [settings, setSettings] = useState<PlanSettings>(() => defaultSettings(SAMPLE_ORIGIN));
  const [scenario, setScenario] = useState<Scenario>(() => emptyScenario());
  // The Loads panel's files belong to the workspace: saved with it and reopened with it.
  const [loadFiles, setLoadFiles] = useState<LoadFiles | null>(null);
  const [selected, setSelected] = useState<number | null>(null);
  // Panel sizes are part of the workspace: saved with it, reopened with it.
  const panels = useLayout();
  const { restore: restoreLayout } = panels;
  // The status line's message belongs to the action that set it: it stands until the next action
  // (new settings, a scenario edit, a selection, loads files), then it is gone ("Opened the sample
  // carrier." stayed on screen through later edits). A message is tied to the action state of the
  // first render that shows it (`at` null until then), so it survives the render its own action makes.
  const [posted, setPosted] = useState<{ text: string; at: object | null } | null>(null);
  const setMessage = useCallback((text: string | null) => setPosted(text === null ? null : { text, at: null }), []);
  const lifecycle = useMemo(() => new LifecycleStore(), []);
  const life = useSyncExternalStore(lifecycle.subscribe, lifecycle.snapshot);
  // Browser mode keeps the workspace as it changes (below), but a sample, an import or a scenario
  // file replacing it drops the what-if edits for good: there "unsaved" means edits not yet written
  // to a scenario file (saved, or loaded from one). A reload reopens the kept edits still unsaved.
  const [savedScenario, setSavedScenario] = useState<string | null>(null);
  const scenarioText = useMemo(() => serializeScenarioDocument(scenario), [scenario]);
  const dirty = host.kind === 'web' ? hasChanges(scenario) && scenarioText !== savedScenario : isDirty(life);
  const savedPath = life.savedPath;
  const settingsRef = useRef(settings);
  settingsRef.current = settings;
  const plan = usePlan(engine, dataset.network, settings, scenario, selected, generation);
  const actionState = useMemo(() => ({}), [settings, scenario, selected, loadFiles]);
  useEffect(() => {
    if (posted && posted.at === null) setPosted({ ...posted, at: actionState });
  }, [posted, actionState]);
  const message = posted && (posted.at === null || posted.at === actionState) ? posted.text : null;

  const loadSample = useCallback(
    async (loop: boolean) => {
      const next = { ...settingsRef.current, origin: SAMPLE_ORIGIN, dispatchDate: SAMPLE_DATE };
      const files = sampleFiles(loop);
      const ok = await load(files, planOf(next));
      if (ok) {
        const fresh = emptyScenario();
        setSettings(next);
        setScenario(fresh);
        setLoadFiles(null);
        setSelected(null);
        // A new workspace: Save must ask where, not overwrite the workspace opened before.
        lifecycle.dispatch({ type: 'opened', savedPath: null, key: workspaceFingerprint(documentOf(files, next, fresh)) });
        setMessage(loop ? 'Opened the sample carrier with a rebate loop.' : 'Opened the sample carrier.');
      }
    },
    [load, lifecycle],
  );

  // Null when the workspace did not open; otherwise a note for the message ('' when none).
  const openDocument = useCallback(
    async (doc: Parameters<typeof stateOf>[0], path: string | null): Promise<string | null> => {
      const state = stateOf(doc);
      const files = await filesOf(host, doc);
      if (files && (await load(files, planOf(state.settings)))) {
        const loads = await loadFilesOf(host, doc);
        setSettings(state.settings);
        setScenario(state.scenario);
        setLoadFiles(loads.files);
        setSelected(null);
        restoreLayout(state.layout);
        // A loads file that could not be read is left out: the document then differs, so it is dirty.
        lifecycle.dispatch({ type: 'opened', savedPath: path, key: workspaceFingerprint(documentOf(files, state.settings, state.scenario, loads.files)) });
        return loads.problem === null ? '' : `Note: ${loads.problem}.`;
      }
      return null;
    },
    [host, load, lifecycle, restoreLayout],
  );

  // First show: the last workspace when there is one, otherwise the sample so a plan is on screen.
  // Why the last workspace did not open is said after the sample's own message.
  useEffect(() => {
    if (lifecycle.state.phase !== 'starting') return;
    lifecycle.dispatch({ type: 'restore-started' });
    void (async () => {
      let problem: string | null = null;
      try {
        const recent = host.kind === 'web' ? null : await host.recentWorkspaces();
        const path = recent && recent.ok && recent.value.length > 0 ? recent.value[0].path : null;
        if (host.kind === 'web' || path) {
          const opened = await host.openWorkspace(path);
          if (!opened.ok) problem = opened.failure.message;
          else if (opened.value) {
            const note = await openDocument(opened.value.document, opened.value.path);
            if (note) setMessage(note);
            if (note !== null) return;
          }
        }
      } catch (error) {
        problem = (error as Error).message;
      }
      await loadSample(false);
      if (problem !== null) setMessage(`Could not reopen the last workspace: ${problem}. Showing the sample instead.`);
    })().finally(() => lifecycle.dispatch({ type: 'replace-ended' }));
  }, [host, openDocument, loadSample, lifecycle]);

  // A new day, vehicle class or planning setting re-plans the import (lanes valid that day, that
  // class's tolls, estimates by the settings). When
  // the re-plan is cancelled or refused the network stays on its plan, so the controls go back to it:
  // otherwise they would name a day or class the results on screen were not planned for.
  const { network } = dataset;
  useEffect(() => {
    if (!network) return;
    const wanted = planOf(settings);
    if (wanted.date === network.plan.date && wanted.vehicleClass === network.plan.vehicleClass && samePlanningChoices(wanted.planning, network.plan.planning)) return;
    void replan(wanted).then((ok) => {
      if (ok) return;
      setSettings((now) =>
        now.dispatchDate === wanted.date && now.vehicleClass === wanted.vehicleClass && samePlanningChoices(now.planning, wanted.planning)
          ? { ...now, dispatchDate: network.plan.date, vehicleClass: network.plan.vehicleClass, planning: network.plan.planning }
          : now,
      );
    });
  }, [network, settings, replan]);

  // The panel sizes are laid on last: dragging a splitter makes a new document to keep, but not a new
  // fingerprint (they do not count as a change), so the fingerprint is not recomputed per pointer move.
  const content = useMemo(() => documentOf(dataset.files, settings, scenario, loadFiles), [dataset.files, settings, scenario, loadFiles]);
  const document = useMemo(() => ({ ...content, layout: { ...panels.chosen } }), [content, panels.chosen]);

  // The lifecycle compares this fingerprint with the one last opened or saved ("unsaved" means the
  // document really differs); the first document after an open is the clean one.
  const docKey = useMemo(() => workspaceFingerprint(content), [content]);
  useEffect(() => {
    if (dataset.files) lifecycle.dispatch({ type: 'document', key: docKey });
  }, [lifecycle, docKey, dataset.files]);
  useEffect(() => lifecycle.dispatch({ type: dataset.importing ? 'import-started' : 'import-ended' }), [lifecycle, dataset.importing]);

  // Browser mode keeps the workspace as it changes; the desktop tracks unsaved changes for the quit prompt.
  useEffect(() => {
    if (!dataset.files) return;
    if (host.kind === 'web') void host.saveWorkspace(document, null, false);
  }, [host, document, dataset.files]);
  useEffect(() => {
    if (host.kind !== 'web') void host.setDirty(dirty);
  }, [host, dirty]);

  const save = useCallback(
    async (saveAs: boolean) => {
      // The document as it is when the save starts is the one that becomes clean.
      const key = docKey;
      lifecycle.dispatch({ type: 'save-started' });
      try {
        const result = await host.saveWorkspace(document, lifecycle.state.savedPath, saveAs);
        if (result.ok && result.value) {
          lifecycle.dispatch({ type: 'saved', path: result.value.path, key });
          setMessage(`Workspace saved to ${result.value.path}.`);
          return true;
        }
        if (!result.ok) setMessage(`Not saved: ${result.failure.message}`);
        lifecycle.dispatch({ type: 'save-failed' });
        return false;
      } catch (error) {
        lifecycle.dispatch({ type: 'save-failed' });
        throw error;
      }
    },
    [host, document, docKey, lifecycle],
  );

  /** Writes the scenario as a scenario file (the versioned JSON `lanewright compare` reads); true when written. */
  const saveScenarioFile = useCallback(async (): Promise<boolean> => {
    const text = serializeScenarioDocument(scenario);
    const result = await host.saveExport(scenarioFileName(scenario.name), text, 'scenario');
    if (!result.ok) {
      setMessage(`Scenario file not saved: ${result.failure.message}`);
      return false;
    }
    if (!result.value) return false;
    setSavedScenario(text);
    setMessage(`Saved the scenario file ${result.value.path}.`);
    return true;
  }, [host, scenario, setMessage]);

  /** A scenario read from a scenario file: it is saved as it stands. */
  const scenarioFromFile = useCallback((next: Scenario) => {
    setScenario(next);
    setSavedScenario(serializeScenarioDocument(next));
  }, []);

  // Every action that replaces the workspace goes through `replaceWith`: none starts while an
  // import runs (a second one would race the first), and unsaved changes are asked about first
  // (Save: the workspace file on the desktop, a scenario file in browser mode).
  const { discardPrompt, confirmDiscard, answerDiscard } = useDiscardGuard(dirty, () => (host.kind === 'web' ? saveScenarioFile() : save(false)));
  const replaceWith = useCallback(
    async (action: string, run: () => void | Promise<void>): Promise<void> => {
      if (lifecycle.state.phase === 'importing') return setMessage(`${action} must wait: an import is running (cancel it or let it finish).`);
      lifecycle.dispatch({ type: 'replace-started' });
      try {
        if (await confirmDiscard(action)) await run();
      } finally {
        lifecycle.dispatch({ type: 'replace-ended' });
      }
    },
    [confirmDiscard, lifecycle],
  );

  const openSample = useCallback(
    (loop: boolean) => replaceWith(loop ? 'Opening the sample carrier with a rebate loop' : 'Opening the sample carrier', () => loadSample(loop)),
    [replaceWith, loadSample],
  );

  const openWorkspace = useCallback(
    async (path: string | null) => {
      // An import in the engine would race the one this starts; asked before the file dialog opens.
      if (lifecycle.state.phase === 'importing') return setMessage('Opening a workspace must wait: an import is running (cancel it or let it finish).');
      const opened = await host.openWorkspace(path);
      if (!opened.ok) return setMessage(`Could not open the workspace: ${opened.failure.message}`);
      if (!opened.value) return;
      const chosen = opened.value;
      await replaceWith(`Opening ${chosen.path}`, async () => {
        try {
          const note = await openDocument(chosen.document, chosen.path);
          if (note !== null) setMessage(`Opened ${chosen.path}.${note ? ` ${note}` : ''}`);
        } catch (error) {
          // A file the workspace names could not be read: the workspace on screen stays as it was.
          setMessage(`Could not open the workspace: ${(error as Error).message}`);
        }
      });
    },
    [host, openDocument, replaceWith, lifecycle],
  );

  const importFiles = useCallback(
    async (files: DatasetFiles) => {
      const ok = await load(files, planOf(settingsRef.current));
      if (ok) {
        setSelected(null);
        setScenario(emptyScenario());
        setMessage(`Imported ${files.depots.name} and ${files.lanes.name}.`);
      }
      return ok;
    },
    [load, setMessage],
  );

  // "Continue with the accepted rows" finishes an import: like a clean one it starts without what-if
  // edits (they named rows of the files before and stayed over the new network).
  const { continueWithAccepted, pending } = dataset;
  const continueImport = useCallback(async () => {
    const files = pending?.files;
    const ok = await continueWithAccepted();
    if (ok && files) {
      setSelected(null);
      setScenario(emptyScenario());
      setMessage(`Imported the accepted rows of ${files.depots.name} and ${files.lanes.name}.`);
    }
    return ok;
  }, [continueWithAccepted, pending, setMessage]);

  return { host, panels, continueImport, engine, progress, dataset, settings, setSettings, scenario, setScenario, saveScenarioFile, scenarioFromFile, loadFiles, setLoadFiles, selected, setSelected, plan, message, setMessage, dirty, save, openWorkspace, openSample, importFiles, replaceWith, discardPrompt, answerDiscard };
}

export type Workbench = ReturnType<typeof useWorkbench>;
