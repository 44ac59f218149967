// Module-private scratch (grown on demand): the ideal shares, their remainders and the order.
let idealScratch = new Float64Array(16);
let fractionScratch = new Float64Array(16);
let orderScratch = new Int32Array(16);

/**
 * Shares `total` panels (or strips) among the first k intervals in proportion to their lengths, at
 * least one each, by the largest-remainder method (Hamilton's apportionment: each gets 1 + the floor
 * of its share of the spare total - k, and the rest go one each in order of decreasing remainder,
 * ties to the first interval), written into counts. No allocation once its scratch has grown.
 */
export function allocateByLength(
  lengths: Float64Array,
  k: number,
  total: number,
  counts: Float64Array,
): void {
  if (!Number.isInteger(k) || k < 1 || lengths.length < k || counts.length < k) {
    throw new RangeError(`allocateByLength: k=${k} must be a positive integer within lengths and counts`);
  }
  if (idealScratch.length < k) {
    idealScratch = new Float64Array(k);
    fractionScratch = new Float64Array(k);
    orderScratch = new Int32Array(k);
  }
  const ideal = idealScratch;
  const fraction = fractionScratch;
  const order = orderScratch;
  let sum = 0;
  for (let j = 0; j < k; j++) sum += lengths[j]!;
  const spare = total - k;
  let assigned = 0;
  for (let j = 0; j < k; j++) {
    const x = sum > 0 ? (lengths[j]! / sum) * spare : spare / k;
    ideal[j] = x;
    counts[j] = 1 + Math.floor(x);
    assigned += counts[j]!;
    fraction[j] = x - Math.floor(x);
    // Insertion by remainder, largest first; equal remainders keep the interval order.
    let at = j;
    while (at > 0 && fraction[order[at - 1]!]! < fraction[j]!) {
      order[at] = order[at - 1]!;
      at--;
    }
    order[at] = j;
  }
  let left = total - assigned;
  for (let q = 0; left > 0; q = (q + 1) % k, left--) counts[order[q]!]!++;
}
