// Incremental CSV reading on top of papaparse's whole-string parser: chunks are buffered and cut at
// the last line break that lies outside quotes (quote parity is tracked across chunks), so papaparse
// only ever sees whole records and a million-lane file never sits in memory as one string.

import { splitCsvBlock, type PlainLineTaker } from './csv-block';
import { parseCsvBlock } from './csv-papaparse';
import { scanQuotes } from './csv-quotes';

/** A problem with the file as a whole or with its quoting, before any column is looked at. */
export interface CsvStreamIssue {
  code: 'not-text' | 'unbalanced-quotes';
  /** Row as a spreadsheet numbers it (header = 1). */
  row: number | null;
  /** Column position (0-based) when known. */
  columnIndex: number | null;
  value: string | null;
  /** Data lines that could not be read because of this problem (they count as rejected rows). */
  linesLost: number;
}

export interface CsvRecordSink {
  /**
   * Records in order; `firstRow` is the spreadsheet row of records[0]. Blank records are included
   * (as [""]). `badQuotes` lists positions in `records` whose quoting is malformed; `badText`
   * those holding U+FFFD, which a decoder puts where bytes were not UTF-8 (a Latin-1 file, say).
   */
  records(records: string[][], firstRow: number, badQuotes: readonly number[], badText: readonly number[], strayQuotes?: readonly { row: number; column: number }[]): void;
  issue(issue: CsvStreamIssue): void;
  /**
   * Optional fast path: offered each line without quotes (`text` from `start` to `end`, line break
   * excluded) after the first block, so that a reader can take plain rows without cutting them into
   * cell strings. True = read and counted by the sink; false = it arrives in `records` as usual.
   */
  plainLine?(text: string, start: number, end: number, row: number, delimiter: string): boolean;
}

// A quoted field longer than this is taken to be an unclosed quote rather than data, so a broken
// file cannot make the reader buffer the rest of a huge file.
const MAX_QUOTED_CHARS = 4_000_000;
/** A NUL within this many characters of the start refuses the whole file (not text). */
const NUL_CHECK_CHARS = 65536;

export class CsvRecordStream {
  private pending = '';
  /** The first chunks, held until the NUL check has seen NUL_CHECK_CHARS of them. */
  private head = '';
  private scanned = 0;
  private inQuotes = false;
  private started = false;
  private stopped = false;
  private swallowing = false;
  private swallowLines = 0;
  private swallowRow = 0;
  private nextRow = 1;
  private charsSeen = 0;
  private pendingIssue: { columnIndex: number; value: string } | null = null;
  private lineOpen = false;
  private sepLineSeen = false;
  private layoutKnown = false;
  delimiter = ',';
  newline: '\n' | '\r\n' | '\r' = '\n';

  constructor(private readonly sink: CsvRecordSink) {}

  /** Characters fed so far (after the BOM). */
  get chars(): number {
    return this.charsSeen;
  }

  /** True once the file was found not to be text; later chunks are ignored. */
  get isStopped(): boolean {
    return this.stopped;
  }

  feed(chunk: string): void {
    if (this.stopped || chunk.length === 0) return;
    if (!this.started) {
      // The NUL check sees the first 64 KB however the text is cut: chunks wait until then (or finish).
      this.head += chunk;
      if (this.head.length <= NUL_CHECK_CHARS) return;
      this.start();
      return;
    }
    this.read(chunk);
  }

  // Reads the held first chunks as one, unless a NUL in the first 64 KB refuses the file.
  private start(): void {
    let text = this.head;
    this.head = '';
    if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
    if (text.length === 0) return;
    this.started = true;
    // NUL never occurs in UTF-8 text; UTF-16 files and binaries are full of it.
    if (text.slice(0, NUL_CHECK_CHARS).includes('\u0000')) {
      this.stopped = true;
      this.sink.issue({ code: 'not-text', row: null, columnIndex: null, value: null, linesLost: 0 });
      return;
    }
    this.read(text);
  }

  private read(chunk: string): void {
    this.charsSeen += chunk.length;
    if (this.swallowing) {
      this.countSwallowed(chunk);
      return;
    }
    this.pending += chunk;
    const cut = this.scan();
    if (cut > 0) {
      this.emit(this.pending.slice(0, cut));
      this.pending = this.pending.slice(cut);
      this.scanned -= cut;
    }
    if (this.inQuotes && this.pending.length > MAX_QUOTED_CHARS) this.startSwallowing();
  }

  /** Spreadsheet row of the next record. */
  get row(): number {
    return this.nextRow;
  }

  /** A line the byte reader took (csv-byte-stream.ts) was the next row. */
  rowTaken(): void {
    this.nextRow++;
  }

  /**
   * For the byte reader (csv-byte-stream.ts): when the stream stands between records (header and
   * layout settled, no quote open, nothing stopped) with at most `maxChars` of a partial line, hands
   * that line over and forgets it; else null. CR-only files stay here.
   */
  handOver(maxChars: number): string | null {
    if (!this.started || this.stopped || this.swallowing || this.inQuotes || !this.layoutKnown || this.nextRow === 1 || this.newline === '\r') return null;
    if (this.pending.length > maxChars) return null;
    const rest = this.pending;
    this.pending = '';
    this.scanned = 0;
    return rest;
  }

  finish(): void {
    if (!this.started) this.start();
    if (this.stopped) return;
    if (this.swallowing) {
      this.endSwallowing();
      return;
    }
    if (this.pending.length === 0) return;
    if (!this.inQuotes) {
      this.emit(this.pending);
      this.pending = '';
      return;
    }
    this.startSwallowing();
    this.endSwallowing();
  }

  // Scans the unscanned part of `pending` and returns the offset just after the last line break
  // outside quotes (0 when there is none yet).
  // A quote opens a quoted field only at a field's start (csv-quotes.ts): a stray inch mark in notes
  // is a literal, so it cannot make the rest of the file one quoted field.
  private scan(): number {
    const r = scanQuotes(this.pending, this.scanned, this.pending.length, this.inQuotes, this.separators(), 10, false);
    this.scanned = r.stop;
    this.inQuotes = r.inQuotes;
    return r.lastBreak + 1;
  }

  // The separators an opening quote may follow: the file's once known, all three before.
  private separators(): string {
    return this.layoutKnown ? this.delimiter : ',;\t';
  }

  private emit(block: string): void {
    if (this.nextRow === 1 && !this.sepLineSeen) {
      // Spreadsheet programs may write "sep=;" above the header to name the delimiter; it is not a row.
      const sep = /^sep=(.)\r?\n/i.exec(block);
      this.sepLineSeen = true;
      if (sep) {
        block = block.slice(sep[0].length);
        this.detectLayout(block);
        this.delimiter = sep[1];
      }
    }
    this.detectLayout(block);
    // The first block stays on the general path: the header, the delimiter and the network's
    // currency are settled there. Blocks with U+FFFD stay there too, so every such row is flagged.
    const sink = this.sink;
    // NUL past the first 64 KB (which refuses the whole file) marks its rows as not text, like U+FFFD.
    const suspect = block.includes('\uFFFD') || block.includes('\u0000');
    const fast = sink.plainLine !== undefined && this.nextRow > 1 && !suspect;
    const take: PlainLineTaker | undefined = fast
      ? (text, start, end, before) => {
          if (before !== null) this.deliver(before.rows, before.badQuoteRows, false, before.strayQuoteCells);
          if (!sink.plainLine!(text, start, end, this.nextRow, this.delimiter)) return false;
          this.nextRow++;
          return true;
        }
      : undefined;
    const { rows, badQuoteRows, strayQuoteCells } = splitCsvBlock(block, this.delimiter, this.newline, take);
    this.deliver(rows, badQuoteRows, suspect, strayQuoteCells);
  }

  // Hands records to the sink with their spreadsheet row numbers.
  private deliver(rows: string[][], badQuoteRows: number[], mayHaveBadText: boolean, strayQuotes: readonly { row: number; column: number }[] = []): void {
    if (rows.length === 0) return;
    const first = this.nextRow;
    this.nextRow += rows.length;
    const badText: number[] = [];
    if (mayHaveBadText) rows.forEach((cells, i) => cells.some((c) => c.includes('\uFFFD') || c.includes('\u0000')) && badText.push(i));
    this.sink.records(rows, first, badQuoteRows, badText, strayQuotes);
  }

  private detectLayout(block: string): void {
    if (this.nextRow !== 1 || this.layoutKnown) return;
    this.layoutKnown = true;
    const end = block.indexOf('\n');
    const cr = block.indexOf('\r');
    // Old Mac files break lines with CR alone; they are buffered whole (no LF to cut at) and read here.
    const crOnly = end === -1 && cr !== -1;
    const lineEnd = crOnly ? cr : end;
    const line = lineEnd === -1 ? block : block.slice(0, lineEnd);
    this.newline = crOnly ? '\r' : end > 0 && block.charCodeAt(end - 1) === 13 ? '\r\n' : '\n';
    const counts = [',', ';', '\t'].map((d) => line.split(d).length - 1);
    const best = Math.max(...counts);
    this.delimiter = best === 0 ? ',' : [',', ';', '\t'][counts.indexOf(best)];
  }

  // An opening quote never closes: the records before it are read, the record that holds it and
  // every line after it are lost, and the loss is counted so accepted + rejected still equals total.
  private startSwallowing(): void {
    const s = this.pending;
    const cut = scanQuotes(s, 0, s.length, false, this.separators(), 10, true).lastBreak + 1;
    if (cut > 0) this.emit(s.slice(0, cut));
    const rest = s.slice(cut);
    if (this.nextRow === 1) this.detectLayout(rest);
    const { rows } = parseCsvBlock(rest, this.delimiter, this.newline);
    const broken = rows[0] ?? [''];
    this.swallowRow = this.nextRow;
    this.swallowing = true;
    this.swallowLines = 0;
    this.pending = '';
    this.scanned = 0;
    this.pendingIssue = { columnIndex: broken.length - 1, value: broken[broken.length - 1].split('\n')[0].slice(0, 40).trim() };
    this.countSwallowed(rest);
  }

  private countSwallowed(text: string): void {
    let start = 0;
    for (;;) {
      const nl = text.indexOf('\n', start);
      const line = nl === -1 ? text.slice(start) : text.slice(start, nl);
      if (line.trim() !== '') this.lineOpen = true;
      if (nl === -1) break;
      if (this.lineOpen) this.swallowLines++;
      this.lineOpen = false;
      start = nl + 1;
    }
  }

  private endSwallowing(): void {
    if (this.lineOpen) this.swallowLines++;
    this.lineOpen = false;
    this.stopped = true;
    const issue = this.pendingIssue ?? { columnIndex: null, value: null };
    this.sink.issue({ code: 'unbalanced-quotes', row: this.swallowRow, columnIndex: issue.columnIndex, value: issue.value, linesLost: Math.max(1, this.swallowLines) });
  }
}
