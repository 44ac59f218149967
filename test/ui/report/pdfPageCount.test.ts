import { describe, expect, it } from 'vitest';
import { pdfPageCount } from '../pdfPageCount';

/** A minimal PDF with `n` pages (ISO 32000-1 7.7.3 page tree), written by hand for the test. */
function tinyPdf(n: number, count = n): Uint8Array {
  const kids = Array.from({ length: n }, (_, i) => `${i + 3} 0 R`).join(' ');
  const pages = Array.from(
    { length: n },
    (_, i) => `${i + 3} 0 obj\n<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] >>\nendobj\n`,
  ).join('');
  return new TextEncoder().encode(
    `%PDF-1.4\n1 0 obj\n<< /Type /Catalog /Pages 2 0 R >>\nendobj\n2 0 obj\n<< /Type /Pages /Kids [${kids}] /Count ${count} >>\nendobj\n${pages}trailer\n<< /Root 1 0 R >>\n%%EOF\n`,
  );
}

describe('pdfPageCount', () => {
  it('counts page objects, not the page tree node', () => {
    for (const n of [1, 2, 5]) expect(pdfPageCount(tinyPdf(n)), `${n} pages`).toBe(n);
  });

  it('refuses a page tree whose /Count disagrees, a file that is not a PDF, and a truncated one', () => {
    expect(() => pdfPageCount(tinyPdf(2, 3))).toThrow(/\/Count \(3\) disagrees with the 2 page objects/);
    expect(() => pdfPageCount(new TextEncoder().encode('<html></html>'))).toThrow(/not a PDF/);
    const whole = tinyPdf(1);
    expect(() => pdfPageCount(whole.slice(0, whole.length - 8))).toThrow(/no %%EOF/);
  });
});
