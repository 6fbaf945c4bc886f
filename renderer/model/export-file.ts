// What the Export menu offers: the worker's exports (tables and map layers computed from the plan)
// plus the scenario file, which the UI writes itself from the scenario it holds.

import { exportFileName } from '../../engine/index';
import type { ExportKind } from '../worker/protocol';

/** One entry of the Export menu; the review report is the Contract review's calendar report (HTML). */
export type ExportChoice = ExportKind | 'scenario-json' | 'review-html';

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
