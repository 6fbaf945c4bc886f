// How exported CSV files are written: field separator, decimal mark and byte-order mark. The
// default follows the app's locale; a spreadsheet set to a decimal-comma language opens the
// semicolon, decimal-comma, BOM form as columns with accented names intact.

import { csvDialectText } from '../../../engine/index';
import { setCsvDialect, useCsvDialect } from '../../app/csv-dialect-store';

export function CsvDialectPicker() {
  const dialect = useCsvDialect();
  return (
    <details className="lw-csv-dialect">
      <summary title={csvDialectText(dialect)}>CSV: {dialect.separator === ';' ? 'semicolon' : 'comma'}, {dialect.decimalMark === ',' ? '1,5' : '1.5'}{dialect.bom ? ', BOM' : ''}</summary>
      <div className="lw-csv-dialect-body" role="group" aria-label="CSV format of exports">
        <label>
          Separator{' '}
          <select value={dialect.separator} onChange={(e) => setCsvDialect({ ...dialect, separator: e.target.value as ',' | ';' })}>
            <option value=",">comma ( , )</option>
            <option value=";">semicolon ( ; )</option>
          </select>
        </label>
        <label>
          Decimal mark{' '}
          <select value={dialect.decimalMark} onChange={(e) => setCsvDialect({ ...dialect, decimalMark: e.target.value as '.' | ',' })}>
            <option value=".">point (12.50)</option>
            <option value=",">comma (12,50)</option>
          </select>
        </label>
        <label className="lw-check">
          <input type="checkbox" checked={dialect.bom} onChange={(e) => setCsvDialect({ ...dialect, bom: e.target.checked })} /> UTF-8 byte-order mark
        </label>
      </div>
    </details>
  );
}
