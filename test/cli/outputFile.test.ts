import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { AtomicFile } from '../../src/cli/outputFile';

const dir = mkdtempSync(join(tmpdir(), 'coversweep-atomic-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('AtomicFile with background flushes', () => {
  it('writes every chunk in order while flushing in the background, and leaves no temporary file', async () => {
    const path = join(dir, 'big.csv');
    const file = new AtomicFile(path, false, true);
    // 12 chunks of 1 MB: at least two background flushes start (one every 4 MB, one at a time).
    const chunks = Array.from(
      { length: 12 },
      (_, k) => `${String(k).padStart(2, '0')}:${'x'.repeat(1 << 20)}\n`,
    );
    for (const chunk of chunks) file.write(chunk);
    await file.settled();
    file.commit();
    const text = readFileSync(path, 'utf8');
    expect(text.length, 'the whole content').toBe(chunks.join('').length);
    expect(text === chunks.join(''), 'the chunks in order').toBe(true);
    expect(readdirSync(dir).filter((name) => name.endsWith('.tmp'))).toEqual([]);
  });

  it('keeps the finished chunks of an interrupted run while a background flush may be running', () => {
    const path = join(dir, 'cut.csv');
    const file = new AtomicFile(path, false, true);
    file.write('a'.repeat(5 << 20));
    file.write('b\n');
    const kept = file.keepPartial();
    expect(kept).toBe(`${path}.partial`);
    expect(readFileSync(kept!, 'utf8')).toBe(`${'a'.repeat(5 << 20)}b\n`);
  });
});
