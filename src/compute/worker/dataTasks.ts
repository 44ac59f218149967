/**
 * The data panel's tasks in a task worker (runTask.ts; the kinds in tasks.ts, their data in
 * engine/dataTaskTypes.ts): reading a CSV (a dropped file is handed over as a File and read here, so a
 * large table never blocks the page), guessing its columns, and the comparison. The parsed table stays
 * in this worker under the panel's reference (the pool sends the panel's later tasks back to the worker
 * that holds it); a worker without it reads the source again. The page only ever holds a summary
 * (headers, row count, a few rows, the guessed map) and the text as read with its SHA-256 (kept with the
 * page state). The comparison's per-point results go back as transferred columns (packComparison.ts).
 */
import { transfer } from 'comlink';
import {
  type CsvResult,
  type CsvTable,
  type GuessContext,
  guessMap,
  parseCsvText,
  readCsvStream,
  runComparison,
} from '../compare/index';
import { BoundedCache } from '../engine/boundedCache';
import {
  MAX_INLINE_CHARS,
  type PackedComparison,
  type PackedResult,
  PREVIEW_ROWS,
  type ReadOutcome,
  type TableCompareRequest,
  type TableRef,
  type TableSource,
  type TextOutcome,
} from '../engine/dataTaskTypes';
import { buffersOf, packConverted, packResiduals } from '../engine/packComparison';
import { sha256Hex } from '../sha256';
import { modelAtDataHere } from '../study/dataComparisonStudy';

const tables = new BoundedCache<number, CsvTable>(2);

async function readSource(source: TableSource): Promise<CsvResult> {
  if (source.kind === 'text') return parseCsvText(source.text);
  try {
    return await readCsvStream(source.file.stream() as ReadableStream<Uint8Array>, {
      knownSize: source.file.size,
    });
  } catch (error) {
    return { ok: false, errors: [`could not read the file: ${(error as Error).message}`] };
  }
}

async function textOf(source: TableSource): Promise<TextOutcome> {
  try {
    return { ok: true, text: source.kind === 'text' ? source.text : await source.file.text() };
  } catch (error) {
    return { ok: false, errors: [`could not read the file: ${(error as Error).message}`] };
  }
}

async function tableFor(ref: TableRef): Promise<CsvResult> {
  const kept = tables.get(ref.id);
  if (kept) return { ok: true, value: kept };
  const r = await readSource(ref.source);
  if (r.ok) tables.set(ref.id, r.value);
  return r;
}

export const dataTasks = {
  async readTable(ref: TableRef, context: GuessContext): Promise<ReadOutcome> {
    const r = await tableFor(ref);
    if (!r.ok) return r;
    const t = r.value;
    const read = await textOf(ref.source);
    if (!read.ok) return read;
    const text = read.text;
    return {
      ok: true,
      summary: {
        headers: t.headers,
        rowCount: t.rows.length,
        preview: t.rows.slice(0, PREVIEW_ROWS),
        guess: guessMap(t.headers, t, context),
        text: text.length <= MAX_INLINE_CHARS ? text : null,
        chars: text.length,
        hash: sha256Hex(text),
      },
    };
  },
  tableText: (ref: TableRef): Promise<TextOutcome> => textOf(ref.source),
  async compareTable(request: TableCompareRequest): Promise<PackedResult> {
    const { ref, ...rest } = request;
    const t = await tableFor(ref);
    if (!t.ok) return t;
    let result: ReturnType<typeof runComparison>;
    try {
      result = runComparison({ ...rest, table: t.value }, modelAtDataHere);
    } catch (error) {
      return { ok: false, errors: [error instanceof Error ? error.message : String(error)] };
    }
    if (!result.ok) return result;
    const packed: PackedComparison = {
      report: { ...result.value, converted: [], residuals: [] },
      converted: packConverted(result.value.converted),
      residuals: packResiduals(result.value.residuals),
    };
    return transfer({ ok: true, value: packed }, buffersOf(packed));
  },
};
