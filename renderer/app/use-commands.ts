// Commands shared by the header buttons and the desktop application menu: exports go through the
// worker (which holds the plan) and then to the host (save dialog or download).

import { useCallback, useEffect } from 'react';
import type { MenuCommand } from '../../main/ipc/contract';
import { EXPORT_MENU, exportFileName } from '../../engine/index';
import { hasChanges } from '../model/scenario-edits';
import type { ExportChoice } from '../model/export-file';
import { csvDialect } from './csv-dialect-store';
import type { Workbench } from './use-workbench';

export interface CommandHandlers {
  openImport(): void;
  openAbout(): void;
}

export function useCommands(bench: Workbench, ui: CommandHandlers) {
  const { host, engine, setMessage, save, openWorkspace, openSample, saveScenarioFile, scenario } = bench;

  // The printable review of the whole calendar under the active scenario (fixed by lane), as the
  // Contract review tab makes it; the worker keeps the calendar review while only the date changes.
  const reviewReport = useCallback(async () => {
    const { review } = await engine.track((onProgress) => engine.client.request('review', { scenario, fixBy: 'lane' }, onProgress), 'Reviewing the contract');
    if (!review.calendar || !review.calendarHtml) throw new RangeError('the calendar review is not available');
    const w = review.calendar.window;
    const fileName = exportFileName({ kind: `contract-review-${w.from === null ? 'undated' : `${w.from}-${w.to}`}`, scenario: hasChanges(scenario) ? scenario.name : null }, 'html');
    return { fileName, text: review.calendarHtml };
  }, [engine, scenario]);

  const exportFile = useCallback(
    async (what: ExportChoice) => {
      try {
        // The scenario file is the scenario as held here (every change, including ones the loaded
        // files no longer match), in the versioned format `lanewright compare --scenario` reads;
        // once written, browser mode no longer counts its edits as unsaved.
        if (what === 'scenario-json') return void (await saveScenarioFile());
        const file = what === 'review-html' ? await reviewReport() : await engine.client.request('export', { what, dialect: csvDialect() });
        const kind = EXPORT_MENU.find((entry) => entry.what === what)?.file ?? 'csv';
        const result = await host.saveExport(file.fileName, file.text, kind);
        if (!result.ok) setMessage(`Export failed: ${result.failure.message}`);
        else if (result.value) setMessage(`Exported ${result.value.path}.`);
      } catch (error) {
        setMessage(`Export failed: ${(error as Error).message}`);
      }
    },
    [engine, host, setMessage, saveScenarioFile, reviewReport],
  );

  // Subscribed again only when a handler changes (the workbench object itself is new every render).
  useEffect(
    () =>
      host.onMenuCommand((command: MenuCommand) => {
        switch (command.command) {
          case 'open-workspace':
            return void openWorkspace(command.path);
          case 'new-workspace':
            return void openSample(false);
          case 'import-depots':
          case 'import-lanes':
            return ui.openImport();
          case 'save':
            return void save(false);
          case 'save-as':
            return void save(true);
          case 'export':
            return void exportFile(command.what);
          case 'about':
            return ui.openAbout();
        }
      }),
    [host, openSample, ui, save, openWorkspace, exportFile],
  );

  return { exportFile };
}
