/** Break a line of text at spaces into lines of at most `maxChars` characters (a longer word stands alone). */
export function wrapText(text: string, maxChars: number): string[] {
  if (!(Number.isInteger(maxChars) && maxChars > 0)) {
    throw new RangeError(`wrapText: maxChars must be a positive integer (got ${maxChars})`);
  }
  const out: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter((w) => w !== '')) {
    if (line === '') line = word;
    else if (line.length + 1 + word.length <= maxChars) line += ` ${word}`;
    else {
      out.push(line);
      line = word;
    }
  }
  if (line !== '' || out.length === 0) out.push(line);
  return out;
}
