// A read-only table from column definitions: header cells with scope, numeric columns right-aligned,
// one row header per row. The review, import-report and lane tables share it instead of each
// spelling out the same header and cell markup.

import type { ReactNode } from 'react';

/** One column: its header text and how a row fills its cell. */
export interface Column<R> {
  label: string;
  numeric?: boolean;
  /** The cell that names the row (a `th scope="row"`). */
  rowHeader?: boolean;
  cell(row: R): ReactNode;
}

/** Header row of a table (also for tables whose body is their own, such as the editable lane table). */
export function TableHead({ labels }: { labels: readonly (string | { label: string; numeric?: boolean })[] }) {
  return (
    <thead>
      <tr>
        {labels.map((c) => {
          const { label, numeric } = typeof c === 'string' ? { label: c, numeric: false } : c;
          return (
            <th key={label} scope="col" className={numeric ? 'lw-num' : undefined}>
              {label}
            </th>
          );
        })}
      </tr>
    </thead>
  );
}

export interface DataTableProps<R> {
  columns: readonly Column<R>[];
  rows: readonly R[];
  rowKey(row: R, index: number): string | number;
  /** Accessible name of the table. */
  label?: string;
  className?: string;
}

export function DataTable<R>({ columns, rows, rowKey, label, className = 'lw-compact' }: DataTableProps<R>) {
  return (
    <table className={className} aria-label={label}>
      <TableHead labels={columns} />
      <tbody>
        {rows.map((row, i) => (
          <tr key={rowKey(row, i)}>
            {columns.map((c) =>
              c.rowHeader ? (
                <th key={c.label} scope="row">
                  {c.cell(row)}
                </th>
              ) : (
                <td key={c.label} className={c.numeric ? 'lw-num' : undefined}>
                  {c.cell(row)}
                </td>
              ),
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The Row, Lane and Ref columns every lane table starts with. */
export function laneColumns<R extends { row: number; from: string; to: string; ref: string | null }>(): Column<R>[] {
  return [
    { label: 'Row', cell: (r) => r.row },
    { label: 'Lane', rowHeader: true, cell: (r) => `${r.from} → ${r.to}` },
    { label: 'Ref', cell: (r) => r.ref ?? '—' },
  ];
}
