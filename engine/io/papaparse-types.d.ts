// Hand-written types for the parts of papaparse the engine uses. The DefinitelyTyped package
// references Node's types, which would quietly let `process` and `Buffer` compile inside the
// engine; this narrow declaration keeps the engine free of Node. @types/papaparse is
// deliberately not installed, so TypeScript falls back to this ambient module.

declare module 'papaparse' {
  export interface ParseError {
    type: string;
    code: string;
    message: string;
    row?: number;
  }
  export interface ParseMeta {
    delimiter: string;
    linebreak: string;
    aborted: boolean;
    truncated: boolean;
    cursor: number;
  }
  export interface ParseResult<T> {
    data: T[];
    errors: ParseError[];
    meta: ParseMeta;
  }
  export interface Parser {
    abort(): void;
    pause(): void;
    resume(): void;
  }
  export interface ParseConfig<T> {
    delimiter?: string;
    delimitersToGuess?: string[];
    newline?: string;
    quoteChar?: string;
    skipEmptyLines?: boolean | 'greedy';
    header?: false;
    dynamicTyping?: false;
    preview?: number;
    step?: (results: ParseResult<T>, parser: Parser) => void;
    chunk?: (results: ParseResult<T>, parser: Parser) => void;
    chunkSize?: number;
  }
  export interface UnparseConfig {
    quotes?: boolean | boolean[] | ((value: unknown, column: number) => boolean);
    quoteChar?: string;
    escapeChar?: string;
    delimiter?: string;
    newline?: string;
    header?: boolean;
    escapeFormulae?: boolean | RegExp;
  }
  export function parse<T>(input: string, config?: ParseConfig<T>): ParseResult<T>;
  export function unparse(data: unknown[][], config?: UnparseConfig): string;
  const Papa: { parse: typeof parse; unparse: typeof unparse };
  export default Papa;
}
