/**
 * The number of pages of a PDF, read from its structure (ISO 32000-1, 7.7.3): the page objects
 * (`/Type /Page`, not the `/Type /Pages` tree nodes) are counted, and the page tree root's `/Count`
 * must agree. Chromium writes these dictionaries uncompressed; a PDF that keeps them in compressed
 * object streams gives no count and is reported as such rather than guessed.
 */
export function pdfPageCount(pdf: Uint8Array): number {
  const text = new TextDecoder('latin1').decode(pdf);
  if (!text.startsWith('%PDF-'))
    throw new Error(`not a PDF: starts with ${JSON.stringify(text.slice(0, 8))}`);
  if (!/%%EOF\s*$/.test(text)) throw new Error('not a complete PDF: no %%EOF at the end');
  const pages = text.match(/\/Type\s*\/Page(?![A-Za-z])/g)?.length ?? 0;
  const counts = [
    ...text.matchAll(/\/Type\s*\/Pages\b[^>]*?\/Count\s+(\d+)|\/Count\s+(\d+)[^>]*?\/Type\s*\/Pages\b/g),
  ].map((m) => Number(m[1] ?? m[2]));
  if (pages === 0 || counts.length === 0) {
    throw new Error(`no page objects or page tree found (pages ${pages}, /Count entries ${counts.length})`);
  }
  const root = Math.max(...counts);
  if (root !== pages)
    throw new Error(`the page tree's /Count (${root}) disagrees with the ${pages} page objects`);
  return pages;
}
