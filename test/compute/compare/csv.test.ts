import { describe, expect, it } from 'vitest';
import {
  CsvReader,
  checkDataSize,
  MAX_DATA_BYTES,
  parseCsvText,
  parseNumberCell,
  readCsvStream,
} from '../../../src/compute/compare/csv';

describe('parseCsvText', () => {
  it('reads quoted fields, comments, CRLF and blank lines (RFC 4180)', () => {
    const text = '# comment\r\nyaw,"drag, axial [N]",note\r\n0,1.5,"said ""hi"""\r\n\r\n5,1.4,\n';
    const r = parseCsvText(text);
    expect(r.ok, JSON.stringify(r)).toBe(true);
    if (!r.ok) return;
    expect(r.value.headers).toEqual(['yaw', 'drag, axial [N]', 'note']);
    expect(r.value.rows).toEqual([
      ['0', '1.5', 'said "hi"'],
      ['5', '1.4', ''],
    ]);
    expect(r.value.lineNumbers).toEqual([3, 5]);
  });

  it('detects semicolons and decimal commas (spreadsheet export)', () => {
    const r = parseCsvText('yaw;drag\n0;1,25\n');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.delimiter).toBe(';');
    expect(parseNumberCell(r.value.rows[0]![1]!, r.value.decimalComma)).toBe(1.25);
  });

  it('gives the same table when fed in tiny chunks', () => {
    const text = 'a,b\n"x""y",2\n3,"4\n5"\n';
    const whole = parseCsvText(text);
    const reader = new CsvReader();
    for (const ch of text) reader.push(ch);
    expect(reader.end()).toEqual(whole);
  });

  it('rejects an empty file, a header without rows, ragged rows and an open quote with clear messages', () => {
    const empty = parseCsvText('');
    expect(empty.ok).toBe(false);
    if (!empty.ok) expect(empty.errors[0]).toMatch(/empty/);
    const onlyComments = parseCsvText('# nothing\n\n');
    if (!onlyComments.ok) expect(onlyComments.errors[0]).toMatch(/empty/);
    const header = parseCsvText('yaw,drag\n');
    expect(header.ok).toBe(false);
    if (!header.ok) expect(header.errors[0]).toMatch(/no data rows/);
    const ragged = parseCsvText('yaw,drag\n0,1\n5\n10,1,2\n');
    expect(ragged.ok).toBe(false);
    if (!ragged.ok) {
      expect(ragged.errors[0]).toMatch(/line 3: 1 field, but the header has 2/);
      expect(ragged.errors[1]).toMatch(/line 4: 3 fields/);
    }
    const open = parseCsvText('a,b\n1,"2\n');
    if (!open.ok) expect(open.errors[0]).toMatch(/never closed/);
    const dup = parseCsvText('a,a\n1,2\n');
    if (!dup.ok) expect(dup.errors[0]).toMatch(/appears twice/);
  });

  it('parses numbers strictly: text in a numeric cell is NaN, empty is null', () => {
    expect(parseNumberCell(' 1.5e3 ', false)).toBe(1500);
    expect(parseNumberCell('', false)).toBeNull();
    expect(Number.isNaN(parseNumberCell('12 N', false)!)).toBe(true);
    expect(Number.isNaN(parseNumberCell('1,5', false)!)).toBe(true);
  });
});

describe('size limit', () => {
  it('refuses a 100 MB file from its size before reading', () => {
    const msg = checkDataSize(100 * 1024 * 1024);
    expect(msg).toMatch(/100\.0 MB, more than the 32\.0 MB limit/);
    expect(checkDataSize(1000)).toBeNull();
  });

  it('stops reading a 100 MB stream at the limit, without reading the rest', async () => {
    // Generated lazily: 1 MB chunks of valid 512-byte rows, 100 of them; nothing is written to disk.
    const line = `1.0,${'7'.repeat(507)}\n`;
    const row = new TextEncoder().encode(line.repeat(2048));
    let pulled = 0;
    const stream = new ReadableStream<Uint8Array>({
      start(c) {
        c.enqueue(new TextEncoder().encode('yaw,drag\n'));
      },
      pull(c) {
        if (pulled >= 100) c.close();
        else {
          pulled++;
          c.enqueue(row);
        }
      },
    });
    const r = await readCsvStream(stream);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0]).toMatch(/more than the 32\.0 MB limit/);
    expect(row.byteLength).toBe(1024 * 1024);
    expect(pulled, `chunks pulled=${pulled}`).toBeLessThanOrEqual(
      Math.ceil(MAX_DATA_BYTES / row.byteLength) + 2,
    );
  });

  it('stops at the row limit with a clear message', () => {
    const r = parseCsvText(`a\n${'1\n'.repeat(100001)}`);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0]).toMatch(/more than 100000 data rows/);
  });

  it('reads a small stream like the text parser', async () => {
    const text = 'yaw,drag\n0,1\n5,2\n';
    const stream = new ReadableStream<Uint8Array>({
      start(c) {
        c.enqueue(new TextEncoder().encode(text.slice(0, 7)));
        c.enqueue(new TextEncoder().encode(text.slice(7)));
        c.close();
      },
    });
    expect(await readCsvStream(stream)).toEqual(parseCsvText(text));
  });
});
