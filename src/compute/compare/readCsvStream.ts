/** Reading a CSV byte stream: encoding from the byte-order mark, size limit, chunk by chunk. */
import { CsvReader } from './csvReader';
import { type CsvResult, checkDataSize, MAX_DATA_BYTES } from './csvTable';

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
