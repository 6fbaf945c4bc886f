// The contract review as CSV, the same tables `lanewright audit` writes: one row per lane of the
// one-day review (amounts, loops, the fix plan's new net, floor and headroom), or one row per lane
// row and class of the calendar review. Written through the one CSV writer (cell guard included).

import { formatCsvRows } from '../io/csv-papaparse';
import type { Network } from '../network/types';
import { auditLaneRows, type AuditReport } from '../report/audit-report';
import { calendarLaneRows, type CalendarReport } from '../report/calendar-report';

/** The one-day review of `network` (the network the review audited) as RFC 4180 text. */
export function reviewCsv(network: Network, report: AuditReport): string {
  return formatCsvRows(auditLaneRows(network, report));
}

/** The calendar review's lane table as RFC 4180 text. */
export function calendarReviewCsv(report: CalendarReport, exponent: number): string {
  return formatCsvRows(calendarLaneRows(report, exponent));
}
