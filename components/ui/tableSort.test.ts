import { describe, expect, it } from "vitest";
import { nextSort, pageOf, sortRows } from "./tableSort";

describe("nextSort", () => {
  it("starts ascending on a new column, then flips", () => {
    expect(nextSort(null, "d")).toEqual({ id: "d", desc: false });
    expect(nextSort({ id: "e", desc: true }, "d")).toEqual({ id: "d", desc: false });
    expect(nextSort({ id: "d", desc: false }, "d")).toEqual({ id: "d", desc: true });
  });

  it("returns to the rows' own order on the third click only when that order means something", () => {
    expect(nextSort({ id: "d", desc: true }, "d", true)).toBeNull();
    expect(nextSort({ id: "d", desc: true }, "d")).toEqual({ id: "d", desc: false });
  });
});

describe("sortRows", () => {
  const rows = [
    { w: "17x10", d: 889 },
    { w: "17x9", d: null },
    { w: "17x8.5", d: 838.2 },
    { w: "18x9", d: 889 },
  ];

  it("orders numbers by size and keeps rows without a value last, either way", () => {
    expect(sortRows(rows, (r) => r.d, false).map((r) => r.w)).toEqual(["17x8.5", "17x10", "18x9", "17x9"]);
    expect(sortRows(rows, (r) => r.d, true).map((r) => r.w)).toEqual(["17x10", "18x9", "17x8.5", "17x9"]);
  });

  it("keeps ties in their own order in both directions (the finder's rank stays the tie-break)", () => {
    expect(
      sortRows(rows, (r) => r.d, true)
        .slice(0, 2)
        .map((r) => r.w),
    ).toEqual(["17x10", "18x9"]);
  });

  it("orders text naturally, digits by value, letters without regard to case", () => {
    // Common practice, no source: people read "17x9" before "17x10".
    expect(sortRows(rows, (r) => r.w, false).map((r) => r.w)).toEqual(["17x8.5", "17x9", "17x10", "18x9"]);
    expect(sortRows([{ n: "bo" }, { n: "Ada" }, { n: "ada" }], (r) => r.n, false).map((r) => r.n)).toEqual(["Ada", "ada", "bo"]);
  });

  it("treats NaN and Infinity as figures: NaN has none, Infinity sorts after every number", () => {
    const r = sortRows(
      [
        { v: Infinity, n: 1 },
        { v: NaN, n: 2 },
        { v: 2, n: 3 },
        { v: Infinity, n: 4 },
      ],
      (x) => x.v,
      true,
    );
    expect(r.map((x) => x.n)).toEqual([1, 4, 3, 2]);
  });

  it("does not change the rows it was given", () => {
    const before = rows.map((r) => r.w);
    sortRows(rows, (r) => r.d, true);
    expect(rows.map((r) => r.w)).toEqual(before);
  });
});

describe("pageOf", () => {
  const rows = Array.from({ length: 53 }, (_, i) => i + 1);

  it("cuts 25 a page: 53 rows make three pages, the last with 3", () => {
    expect(pageOf(rows, 0, 25)).toMatchObject({ pageIndex: 0, pageCount: 3 });
    expect(pageOf(rows, 0, 25).rows).toEqual(rows.slice(0, 25));
    expect(pageOf(rows, 2, 25).rows).toEqual([51, 52, 53]);
  });

  it("shows the last page for a page past the end, and one empty page for no rows", () => {
    expect(pageOf(rows, 9, 25)).toMatchObject({ pageIndex: 2, rows: [51, 52, 53] });
    expect(pageOf(rows, -1, 25).pageIndex).toBe(0);
    expect(pageOf([], 0, 25)).toEqual({ rows: [], pageIndex: 0, pageCount: 1 });
  });
});
