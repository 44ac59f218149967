/**
 * Reading measured or simulated results as CSV (RFC 4180: quoted fields, doubled quotes; CRLF, LF or
 * CR-only line ends, the last from old spreadsheet exports) or a table pasted from a spreadsheet
 * (tab-separated). Byte streams are UTF-8, or UTF-16 (little- or big-endian) with its byte-order mark
 * (WHATWG Encoding: BOM sniffing); UTF-16 without a mark, or any NUL character, is refused by name. The delimiter is detected from the header line
 * (comma, semicolon or tab, whichever occurs most outside quotes); with a semicolon or tab delimiter a
 * decimal comma ("1,25") is accepted. Lines starting with '#' and blank lines are skipped. The reader is
 * incremental (text pushed chunk by chunk), so large files are streamed, with a size limit checked
 * before reading when the size is known and while reading otherwise. Nothing here touches the original
 * file. Browser-safe: no Node imports.
 */

/** Largest data file accepted (bytes). Tunnel and CFD result tables are far smaller. */
export const MAX_DATA_BYTES = 32 * 1024 * 1024;
/** Most data rows accepted. */
export const MAX_DATA_ROWS = 100_000;
/** The header line must start within this many characters (after comments and blank lines). */
export const MAX_PREAMBLE_CHARS = 1024 * 1024;
/** Most columns accepted in one row. */
export const MAX_DATA_COLUMNS = 1000;
/** Most error messages reported for one file. */
export const MAX_CSV_ERRORS = 20;

export type Delimiter = ',' | ';' | '\t';

export interface CsvTable {
  headers: string[];
  /** Data rows (trimmed cells), each as long as `headers`. */
  rows: string[][];
  /** 1-based line number in the file where each row starts. */
  lineNumbers: number[];
  delimiter: Delimiter;
  /** True when numbers may use a decimal comma (semicolon or tab delimiter). */
  decimalComma: boolean;
}

export type CsvResult = { ok: true; value: CsvTable } | { ok: false; errors: string[] };

function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
  if (bytes >= 1024) return `${(bytes / 1024).toFixed(1)} kB`;
  return `${bytes} bytes`;
}

/** A message when a file of `bytes` is too large to read, else null. Check before reading. */
export function checkDataSize(bytes: number, maxBytes = MAX_DATA_BYTES): string | null {
  if (!(bytes >= 0)) return `data file size ${bytes}: not a valid size`;
  if (bytes > maxBytes) {
    return (
      `data file is ${formatBytes(bytes)}, more than the ${formatBytes(maxBytes)} limit: a comparison needs a table ` +
      `of results (yaw angle, forces, ...), not raw samples; average or decimate it first (at most ${MAX_DATA_ROWS} rows)`
    );
  }
  return null;
}

function detectDelimiter(line: string): Delimiter {
  const counts: Record<Delimiter, number> = { ',': 0, ';': 0, '\t': 0 };
  let quoted = false;
  for (const ch of line) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && (ch === ',' || ch === ';' || ch === '\t')) counts[ch]++;
  }
  let best: Delimiter = ',';
  for (const d of ['\t', ';', ','] as const) if (counts[d] > counts[best]) best = d;
  return best;
}

/** Incremental CSV reader: push text chunks, then call end(). */
export class CsvReader {
  private delimiter: Delimiter | null = null;
  private pending = '';
  /** Start of the first line of `pending` not yet known to be blank or a comment. */
  private scanStart = 0;
  /** `pending` holds no line break from scanStart up to here. */
  private scanned = 0;
  private field = '';
  private record: string[] = [];
  private quoted = false;
  private quotePending = false;
  private fieldWasQuoted = false;
  private line = 1;
  private recordLine = 1;
  private atRecordStart = true;
  private commentLine = false;
  private headers: string[] | null = null;
  private rows: string[][] = [];
  private lineNumbers: number[] = [];
  private errors: string[] = [];
  private bytes = 0;
  private stopped = false;
  private sawNul = false;

  constructor(private readonly maxRows = MAX_DATA_ROWS) {}

  /** A CR at the end of the last chunk: a line end, or the first half of a CRLF. */
  private carryCr = false;

  /** Every line end (CRLF, LF or a lone CR) as LF; a CR ending the chunk waits for the next one. */
  private normaliseLineEnds(text: string): string {
    if (this.carryCr) {
      text = `\r${text}`;
      this.carryCr = false;
    }
    if (text.endsWith('\r')) {
      text = text.slice(0, -1);
      this.carryCr = true;
    }
    return text.includes('\r') ? text.replace(/\r\n?/g, '\n') : text;
  }

  /** Feed a chunk of text. Returns false once reading should stop (too many errors or rows). */
  push(text: string): boolean {
    if (this.stopped) return false;
    this.bytes += text.length;
    if (!this.sawNul && text.includes('\u0000')) {
      this.sawNul = true;
      this.error(
        'the file holds NUL characters: it is UTF-16 without a byte-order mark, or not text at all; save it as UTF-8 (or UTF-16 with a byte-order mark) CSV',
      );
      this.stopped = true;
      return false;
    }
    text = this.normaliseLineEnds(text);
    if (this.delimiter === null) {
      this.pending += text;
      const first = this.firstContentLine();
      if (first === null) {
        if (this.pending.length > MAX_PREAMBLE_CHARS) {
          this.error(
            `no header line within the first ${MAX_PREAMBLE_CHARS / (1024 * 1024)} MB (no line break, or only comments and blank lines): not a results table`,
          );
          this.stopped = true;
          this.pending = '';
          return false;
        }
        return true;
      }
      this.delimiter = detectDelimiter(first);
      text = this.pending;
      this.pending = '';
    }
    this.consume(text);
    return !this.stopped;
  }

  /**
   * First non-comment, non-blank complete line of the text so far (null if none yet). Resumes where
   * the previous call stopped, so a long first line or many comment lines arriving in many chunks
   * cost linear, not quadratic, time.
   */
  private firstContentLine(): string | null {
    const text = this.pending;
    while (true) {
      const nl = text.indexOf('\n', this.scanned);
      if (nl < 0) {
        this.scanned = text.length;
        return null;
      }
      const line = text.slice(this.scanStart, nl).replace(/\r$/, '');
      const t = line.trim();
      if (t !== '' && !t.startsWith('#')) return line;
      this.scanStart = nl + 1;
      this.scanned = nl + 1;
    }
  }

  private consume(text: string): void {
    const d = this.delimiter!;
    let i0 = 0;
    if (this.quotePending && text.length > 0) {
      this.quotePending = false;
      if (text[0] === '"') {
        this.field += '"';
        i0 = 1;
      } else {
        this.quoted = false;
      }
    }
    for (let i = i0; i < text.length; i++) {
      const ch = text[i]!;
      if (this.commentLine) {
        if (ch === '\n') {
          this.commentLine = false;
          this.line++;
          this.recordLine = this.line;
        }
        continue;
      }
      if (this.atRecordStart && !this.quoted) {
        if (ch === '#') {
          this.commentLine = true;
          continue;
        }
        this.atRecordStart = false;
        this.recordLine = this.line;
      }
      if (this.quoted) {
        if (ch === '"') {
          if (i + 1 >= text.length) {
            // A quote at the end of a chunk: a doubled quote or the closing one, decided by the next chunk.
            this.quotePending = true;
          } else if (text[i + 1] === '"') {
            this.field += '"';
            i++;
          } else {
            this.quoted = false;
          }
        } else {
          if (ch === '\n') this.line++;
          this.field += ch;
        }
        continue;
      }
      if (ch === '"' && this.field.trim() === '') {
        this.quoted = true;
        this.fieldWasQuoted = true;
        this.field = '';
      } else if (ch === d) {
        this.endField();
      } else if (ch === '\n') {
        this.endField();
        this.endRecord();
        this.line++;
        this.atRecordStart = true;
      } else if (ch !== '\r') {
        this.field += ch;
      }
      if (this.stopped) return;
    }
  }

  private endField(): void {
    this.record.push(this.fieldWasQuoted ? this.field : this.field.trim());
    this.field = '';
    this.fieldWasQuoted = false;
    if (this.record.length > MAX_DATA_COLUMNS) {
      this.error(
        `line ${this.recordLine}: more than ${MAX_DATA_COLUMNS} fields in one row: not a results table (check the delimiter)`,
      );
      this.stopped = true;
    }
  }

  private endRecord(): void {
    const rec = this.record;
    this.record = [];
    if (rec.length === 1 && rec[0] === '') return; // blank line
    if (this.headers === null) {
      this.headers = rec.map((h) => h.trim());
      const seen = new Set<string>();
      for (const [k, h] of this.headers.entries()) {
        if (h === '')
          this.error(`line ${this.recordLine}: header column ${k + 1} is empty (every column needs a name)`);
        else if (seen.has(h))
          this.error(`line ${this.recordLine}: header "${h}" appears twice (column names must be unique)`);
        seen.add(h);
      }
      return;
    }
    if (rec.length !== this.headers.length) {
      this.error(
        `line ${this.recordLine}: ${rec.length} field${rec.length === 1 ? '' : 's'}, but the header has ${this.headers.length} (ragged row; check the delimiter "${this.delimiter === '\t' ? '\\t' : this.delimiter}" and quotes)`,
      );
      return;
    }
    if (this.rows.length >= this.maxRows) {
      this.error(`more than ${this.maxRows} data rows: average or decimate the data first`);
      this.stopped = true;
      return;
    }
    this.rows.push(rec);
    this.lineNumbers.push(this.recordLine);
  }

  private error(message: string): void {
    if (this.errors.length < MAX_CSV_ERRORS) this.errors.push(message);
    if (this.errors.length >= MAX_CSV_ERRORS) this.stopped = true;
  }

  /** Finish reading and return the table or the errors. */
  end(): CsvResult {
    if (this.stopped && this.headers === null && this.errors.length > 0)
      return { ok: false, errors: this.errors };
    if (this.carryCr) {
      this.carryCr = false;
      this.push('\n');
    }
    if (this.delimiter === null) {
      const t = this.pending;
      this.pending = '';
      const hasContent = t.split('\n').some((l) => l.trim() !== '' && !l.trim().startsWith('#'));
      if (!hasContent) return { ok: false, errors: ['the data file is empty (no header line and no data)'] };
      const firstLine = t.split('\n').find((l) => l.trim() !== '' && !l.trim().startsWith('#'))!;
      this.delimiter = detectDelimiter(firstLine);
      this.consume(t);
    }
    if (this.quotePending) {
      this.quotePending = false;
      this.quoted = false;
    }
    if (!this.stopped) {
      if (this.quoted) {
        this.error(`line ${this.recordLine}: a quoted field is never closed (missing ")`);
      } else if (this.field !== '' || this.record.length > 0 || this.fieldWasQuoted) {
        this.endField();
        this.endRecord();
      }
    }
    if (this.headers === null)
      return { ok: false, errors: ['the data file is empty (no header line and no data)'] };
    if (this.errors.length > 0) return { ok: false, errors: this.errors };
    if (this.rows.length === 0) {
      return {
        ok: false,
        errors: [`the data file has a header (${this.headers.join(', ')}) but no data rows`],
      };
    }
    const d = this.delimiter!;
    return {
      ok: true,
      value: {
        headers: this.headers,
        rows: this.rows,
        lineNumbers: this.lineNumbers,
        delimiter: d,
        decimalComma: d !== ',',
      },
    };
  }

  /** Characters read so far. */
  get charactersRead(): number {
    return this.bytes;
  }
}

/** Parse a whole CSV text (or a pasted table). */
export function parseCsvText(text: string, maxBytes = MAX_DATA_BYTES): CsvResult {
  const size = checkDataSize(text.length, maxBytes);
  if (size) return { ok: false, errors: [size] };
  const reader = new CsvReader();
  reader.push(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  return reader.end();
}

/**
 * Read a CSV byte stream (a browser File's `stream()`, or a Node web stream) as UTF-8, chunk by chunk.
 * Gives up with a clear message as soon as more than `maxBytes` have arrived, without reading the rest.
 * `knownSize`, when given (File.size), is checked before reading anything.
 */
export async function readCsvStream(
  stream: ReadableStream<Uint8Array>,
  options: { maxBytes?: number; knownSize?: number } = {},
): Promise<CsvResult> {
  const maxBytes = options.maxBytes ?? MAX_DATA_BYTES;
  if (options.knownSize !== undefined) {
    const msg = checkDataSize(options.knownSize, maxBytes);
    if (msg) return { ok: false, errors: [msg] };
  }
  let decoder: TextDecoder | null = null;
  const reader = stream.getReader();
  const csv = new CsvReader();
  let bytes = 0;
  let first = true;
  let head: Uint8Array = new Uint8Array(0);
  try {
    while (true) {
      const { done, value: chunk } = await reader.read();
      if (done) break;
      bytes += chunk.byteLength;
      let value: Uint8Array = chunk;
      if (decoder === null) {
        // The encoding from the byte-order mark (needs the first 2 bytes; chunks may be tiny).
        head = concatBytes(head, chunk);
        if (head.length < 2) continue;
        decoder = new TextDecoder(encodingFromBom(head));
        value = head;
      }
      if (bytes > maxBytes) {
        await reader.cancel();
        return {
          ok: false,
          errors: [
            `${checkDataSize(bytes, maxBytes)} (stopped reading after ${(bytes / (1024 * 1024)).toFixed(1)} MB)`,
          ],
        };
      }
      let text = decoder.decode(value, { stream: true });
      if (first && text.charCodeAt(0) === 0xfeff) text = text.slice(1);
      first = false;
      if (!csv.push(text)) {
        await reader.cancel();
        break;
      }
    }
    if (decoder === null && head.length > 0) {
      decoder = new TextDecoder('utf-8');
      csv.push(decoder.decode(head, { stream: true }));
    }
    if (decoder) csv.push(decoder.decode());
  } finally {
    reader.releaseLock();
  }
  return csv.end();
}

/** The encoding named by a byte-order mark (UTF-16 LE or BE), else UTF-8 (whose mark is removed later). */
export function encodingFromBom(head: Uint8Array): 'utf-8' | 'utf-16le' | 'utf-16be' {
  if (head[0] === 0xff && head[1] === 0xfe) return 'utf-16le';
  if (head[0] === 0xfe && head[1] === 0xff) return 'utf-16be';
  return 'utf-8';
}

function concatBytes(a: Uint8Array, b: Uint8Array): Uint8Array {
  if (a.length === 0) return b;
  const out = new Uint8Array(a.length + b.length);
  out.set(a);
  out.set(b, a.length);
  return out;
}

/**
 * A cell as a number. Accepts optional spaces, a sign, exponent, and (when `decimalComma`) a comma as
 * the decimal separator. Returns null for an empty cell and NaN for text that is not a number.
 */
export function parseNumberCell(cell: string, decimalComma: boolean): number | null {
  let t = cell.trim();
  if (t === '') return null;
  if (decimalComma && /^[+-]?\d*,\d+([eE][+-]?\d+)?$/.test(t)) t = t.replace(',', '.');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t)) return Number.NaN;
  return Number(t);
}
