// What the Export menu offers (the engine's EXPORT_MENU): the worker's exports (tables and map
// layers computed from the plan), the Contract review's calendar report (HTML), and the scenario
// file, which the UI writes itself from the scenario it holds.

import { exportFileName, type ExportChoice } from '../../engine/index';

export type { ExportChoice };

/**
 * File name for a scenario document: the scenario's name reduced to letters, digits, dots, dashes
 * and underscores (no folders or reserved characters), ending in ".json".
 */
export function scenarioFileName(name: string): string {
  const stem = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9._-]+/g, '-')
    .replace(/^[-.]+|[-.]+$/g, '')
    .slice(0, 80);
  // The stem is already plain; exportFileName adds the checks every export name gets (reserved names, length).
  return exportFileName({ kind: stem === '' ? 'scenario' : stem }, 'json');
}
