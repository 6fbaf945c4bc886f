// The --csv-dialect option: which CSV dialect a command writes (engine/export/csv-dialect.ts owns
// the dialects and re-writes the RFC 4180 text every exporter produces).

import { applyCsvDialect, parseCsvDialect, RFC4180_DIALECT, type CsvDialect } from '../../engine/index';
import { UsageError, type ParsedArgs } from './args';

/** The dialect asked for, RFC 4180 without the option; UsageError for a name it does not know. */
export function csvDialectOption(args: ParsedArgs): CsvDialect {
  const text = args.values.get('csv-dialect');
  if (text === undefined) return RFC4180_DIALECT;
  const dialect = parseCsvDialect(text);
  if (!dialect) throw new UsageError(`--csv-dialect: "${text}" is not a dialect; give comma, semicolon, or SEPARATOR,DECIMAL,BOM such as semicolon,comma,bom`);
  return dialect;
}

/** `text` (RFC 4180 from an exporter) in the dialect the command line asks for. */
export function inCsvDialect(args: ParsedArgs, text: string): string {
  return applyCsvDialect(text, csvDialectOption(args));
}
