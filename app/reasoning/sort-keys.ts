// Ordering indices by a numeric key, descending, without a comparator callback. A comparator
// sort of 3,000 items costs several times more than the engine's native numeric sort, so each
// key carries its own index in the lowest mantissa bits and the keys are sorted natively. This
// keeps the key to a relative precision of 2^−(52 − bits); keys that agree to that precision form
// runs that are put in `tie` order. Runs are short, so `tie` is cheap. Pass the full comparison as
// `tie` for an exact order, or ask for `tieBits` to treat keys within 2^−(52 − tieBits) as equal.
// The low half of a float64 is the first 32-bit word only on little-endian hardware (all current
// x86 and ARM); anything else takes the comparator path.
const LITTLE_ENDIAN = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
const MAX_INDEX_BITS = 20; // beyond a million items, fall back to a comparator sort

export function orderByKeyDesc(
  keys: Float64Array,
  n: number,
  tie: (a: number, b: number) => number,
  tieBits = 0,
): Int32Array {
  const order = new Int32Array(n);
  const bits = Math.max(tieBits, Math.ceil(Math.log2(Math.max(2, n))));
  if (bits > MAX_INDEX_BITS || !LITTLE_ENDIAN) {
    for (let i = 0; i < n; i++) order[i] = i;
    return order.sort((a, b) => keys[b] - keys[a] || tie(a, b));
  }
  const packed = new Float64Array(n);
  const words = new Uint32Array(packed.buffer); // words[2i] is the low half of packed[i]
  const mask = (1 << bits) - 1;
  for (let i = 0; i < n; i++) {
    const k = keys[i];
    // Keys are ≥ 0; +0 turns −0 into 0 and a clamp keeps Infinity (which has no mantissa) out.
    packed[i] = k < Number.MAX_VALUE ? k + 0 : Number.MAX_VALUE;
    words[2 * i] = ((words[2 * i] & ~mask) | i) >>> 0;
  }
  packed.sort(); // native numeric sort, ascending
  for (let r = 0; r < n; r++) order[r] = words[2 * (n - 1 - r)] & mask;
  // Runs of equal keys (after packing) are put in `tie` order.
  let runStart = 0;
  for (let r = 1; r <= n; r++) {
    const p = 2 * (n - 1 - r);
    const q = 2 * (n - r);
    const same = r < n && words[p + 1] === words[q + 1] && (words[p] & ~mask) === (words[q] & ~mask);
    if (same) continue;
    if (r - runStart > 1) order.subarray(runStart, r).sort(tie);
    runStart = r;
  }
  return order;
}
