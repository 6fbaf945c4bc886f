// Turns the two CSV texts into depots, lanes and an import report. The one place the worker reaches
// the engine's importer, so a new importer changes this file only.

import { InputFileError } from '../../engine/errors';
import { readDepotsCsv, readLanesCsv } from '../../engine/import/basic-reader';
import type { DepotInput, LaneInput } from '../../engine/network/types';
import type { ImportIssue, ImportReport, NamedText } from './protocol';

export interface ImportedTexts {
  depots: DepotInput[];
  lanes: LaneInput[];
  report: ImportReport;
}

function dataRows(text: string): number {
  const lines = text.split(/\r\n|\n|\r/).filter((line) => line.trim() !== '');
  return Math.max(0, lines.length - 1);
}

function issueOf(error: unknown, file: string): ImportIssue {
  if (error instanceof InputFileError) {
    return { file: error.file, row: error.row, column: error.column, value: error.value, reason: error.reason };
  }
  return { file, row: null, column: null, value: null, reason: error instanceof Error ? error.message : String(error) };
}

/**
 * Reads both files. With the basic reader a bad row stops the file, so the report then holds that
 * one issue and nothing is accepted from that file (fatal).
 */
export function importTexts(depotsFile: NamedText, lanesFile: NamedText): ImportedTexts {
  const issues: ImportIssue[] = [];
  let depots: DepotInput[] = [];
  let lanes: LaneInput[] = [];
  const depotTotal = dataRows(depotsFile.text);
  const laneTotal = dataRows(lanesFile.text);
  try {
    depots = readDepotsCsv(depotsFile.name, depotsFile.text);
  } catch (error) {
    issues.push(issueOf(error, depotsFile.name));
  }
  try {
    lanes = readLanesCsv(lanesFile.name, lanesFile.text);
  } catch (error) {
    issues.push(issueOf(error, lanesFile.name));
  }
  // Lanes naming unknown depots are rejected per row so the rest of the network still builds.
  if (issues.length === 0) {
    const known = new Set<string>();
    const duplicates: ImportIssue[] = [];
    depots = depots.filter((d, i) => {
      if (known.has(d.id)) {
        duplicates.push({ file: depotsFile.name, row: i + 2, column: 'id', value: d.id, reason: 'duplicate depot id' });
        return false;
      }
      known.add(d.id);
      return true;
    });
    issues.push(...duplicates);
    lanes = lanes.filter((lane) => {
      for (const end of ['from', 'to'] as const) {
        if (!known.has(lane[end])) {
          issues.push({ file: lanesFile.name, row: lane.sourceRow, column: end, value: lane[end], reason: 'no depot with this id' });
          return false;
        }
      }
      return true;
    });
  }
  const fatal = depots.length === 0 || (issues.length > 0 && (depots.length === 0 || lanes.length === 0));
  return {
    depots,
    lanes,
    report: {
      depots: { file: depotsFile.name, total: depotTotal, accepted: depots.length, rejected: depotTotal - depots.length },
      lanes: { file: lanesFile.name, total: laneTotal, accepted: lanes.length, rejected: laneTotal - lanes.length },
      issues,
      fatal,
    },
  };
}
