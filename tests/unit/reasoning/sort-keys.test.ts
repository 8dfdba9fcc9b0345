// The comparator-free ordering used for rankings and plans, against a plain comparator sort.
import { describe, expect, it } from "vitest";
import { orderByKeyDesc } from "~/reasoning/sort-keys";
import { mulberry32 } from "./reference/prng";

describe("orderByKeyDesc", () => {
  it("matches a comparator sort, including ties, zeros and huge keys", () => {
    const rand = mulberry32(5);
    for (const n of [1, 2, 3, 17, 1000, 5000]) {
      const keys = Float64Array.from({ length: n }, () => {
        const r = rand();
        return r < 0.1
          ? 0
          : r < 0.2
            ? 0.25
            : r < 0.22
              ? Infinity
              : r < 0.24
                ? 1e300
                : rand() * 10 ** Math.floor(rand() * 10 - 5);
      });
      const tag = Float64Array.from({ length: n }, () => Math.floor(rand() * 3));
      const exact = (a: number, b: number) =>
        (keys[b] === keys[a] ? 0 : keys[b] > keys[a] ? 1 : -1) || tag[a] - tag[b] || a - b;
      const got = Array.from(orderByKeyDesc(keys, n, exact));
      const want = Array.from({ length: n }, (_, i) => i).sort(exact);
      expect(got).toEqual(want);
    }
  });

  it("with tieBits, keys equal to about 10 digits go to the tie-break", () => {
    // 0.03·(1 + 1e−13) is larger, but within 2^−32 of 0.03: with tieBits the tie-break (index
    // order here) decides; without, the larger key comes first.
    const keys = Float64Array.of(0.03, 0.03 * (1 + 1e-13), 0.02);
    const byIndex = (a: number, b: number) => a - b;
    expect(Array.from(orderByKeyDesc(keys, 3, byIndex, 20))).toEqual([0, 1, 2]);
    expect(Array.from(orderByKeyDesc(keys, 3, byIndex))).toEqual([1, 0, 2]);
    const apart = Float64Array.of(0.03, 0.0300001, 0.02);
    expect(Array.from(orderByKeyDesc(apart, 3, (a, b) => a - b, 20))).toEqual([1, 0, 2]);
  });
});
