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
export { CsvReader, parseCsvText } from './csvReader';
export * from './csvTable';
export { parseNumberCell } from './parseNumberCell';
export { encodingFromBom, readCsvStream } from './readCsvStream';
