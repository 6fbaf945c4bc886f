// A sortable column heading of the windowed tables (results, loads): a button that sorts by the
// column, the column's aria-sort, and an arrow for sighted users (hidden from screen readers, which
// read aria-sort).

export interface SortHeaderProps {
  label: string;
  numeric?: boolean;
  /** This column's sort: ascending, descending, or none. */
  sort: 'ascending' | 'descending' | 'none';
  onSort(): void;
}

export function SortHeader({ label, numeric, sort, onSort }: SortHeaderProps) {
  return (
    <th scope="col" aria-sort={sort} className={numeric ? 'lw-num' : undefined}>
      <button type="button" className="lw-sort" onClick={onSort}>
        {label}
        <span aria-hidden="true">{sort === 'descending' ? ' ▼' : sort === 'ascending' ? ' ▲' : ''}</span>
      </button>
    </th>
  );
}

/** The aria-sort of column `key` under a table's query. */
export const sortOf = (query: { sortKey: string; descending: boolean }, key: string): SortHeaderProps['sort'] => (query.sortKey === key ? (query.descending ? 'descending' : 'ascending') : 'none');
