/** The incremental CSV reader (RFC 4180; see csv.ts for the accepted forms) and whole-text parsing. */
import {
  type CsvResult,
  checkDataSize,
  type Delimiter,
  MAX_CSV_ERRORS,
  MAX_DATA_BYTES,
  MAX_DATA_COLUMNS,
  MAX_DATA_ROWS,
  MAX_PREAMBLE_CHARS,
} from './csvTable';

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
