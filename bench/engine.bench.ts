/**
 * Fitment engine benchmark (plain Node, one core): `npm run bench`.
 * Prints `compareSetups: N per second` (pre-parsed sizes) and `finder: N ms` (one full
 * findFitments search over every standard size for a typical truck).
 */
import { performance } from "node:perf_hooks";
import {
  STANDARD_SIZES,
  compareSetups,
  findFitments,
  parseTireSize,
  setupGeometry,
  tighteningSequence,
  type SetupInput,
} from "../lib/fitment/index";

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
}

/** Runs `fn` in batches for about `ms` milliseconds; returns calls per second (best of rounds). */
function rate(fn: (i: number) => unknown, batch: number, rounds = 5, ms = 400): number {
  let sink = 0;
  const rates: number[] = [];
  for (let r = 0; r < rounds + 1; r++) {
    let calls = 0;
    const start = performance.now();
    let now = start;
    while (now - start < ms) {
      for (let i = 0; i < batch; i++) if (fn(i) !== undefined) sink++;
      calls += batch;
      now = performance.now();
    }
    if (r > 0) rates.push((calls / (now - start)) * 1000); // round 0 is warm-up
  }
  if (sink < 0) console.log(sink);
  return median(rates);
}

const fmt = (n: number): string => Math.round(n).toLocaleString("en-US");

// --- compareSetups, pre-parsed sizes -------------------------------------------------------
const pairs: [SetupInput, SetupInput][] = [
  [
    { tire: parseTireSize("265/70R17"), wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } },
    { tire: parseTireSize("35x12.50R17LT"), wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } },
  ],
  [
    { tire: parseTireSize("LT285/70R17 121/118Q"), wheel: { diameterIn: 17, widthIn: 8.5, offsetMm: 18 } },
    { tire: parseTireSize("37x12.50R17LT"), wheel: { diameterIn: 17, widthIn: 9.5, offsetMm: -31.75 }, spacerMm: 12 },
  ],
  [
    { tire: parseTireSize("275/65R20"), wheel: { diameterIn: 20, widthIn: 8.5, offsetMm: 44 } },
    { tire: parseTireSize("37x13.50R20LT"), wheel: { diameterIn: 20, widthIn: 10, offsetMm: -18 } },
  ],
  [
    { tire: parseTireSize("245/75R16"), wheel: { diameterIn: 16, widthIn: 7, offsetMm: 12 } },
    { tire: parseTireSize("285/75R16"), wheel: { diameterIn: 16, widthIn: 8, offsetMm: 0 } },
  ],
];
const options = { axleRatio: 3.73, kingpinInclinationDeg: 8 };
const compareRate = rate((i) => {
  const p = pairs[i & 3] as [SetupInput, SetupInput];
  return compareSetups(p[0], p[1], options);
}, 10_000);

const geometryRate = rate((i) => setupGeometry((pairs[i & 3] as [SetupInput, SetupInput])[1]), 10_000);
const geoms = pairs.map(([a, b]) => [setupGeometry(a), setupGeometry(b)] as const);
const comparePrecomputedRate = rate((i) => {
  const g = geoms[i & 3] as (typeof geoms)[number];
  return compareSetups(g[0], g[1], options);
}, 10_000);
const parseRate = rate((i) => parseTireSize(i & 1 ? "LT285/70R17 121/118Q" : "37x12.50R17LT"), 2_000);

// --- finder: full search over every standard size ------------------------------------------
const truck = { boltPattern: "6x5.5", minDiameterMm: 800, maxDiameterMm: 950, maxInnerSwingMm: 175, maxOuterSwingMm: 170 };
function timeFinder(opts: Parameters<typeof findFitments>[1], runs: number): { ms: number; evaluated: number; matched: number } {
  let last = findFitments(truck, opts); // warm-up
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    last = findFitments(truck, opts);
    times.push(performance.now() - t0);
  }
  return { ms: median(times), evaluated: last.evaluated, matched: last.matched };
}
const finder = timeFinder({}, 21);
const fineOffsets = Array.from({ length: 137 }, (_, i) => i - 76);
const finderFine = timeFinder({ offsetsMm: fineOffsets, limit: 100 }, 7);

const seqRate = rate(() => tighteningSequence(32), 200, 3, 200);

console.log(`node ${process.version}, ${STANDARD_SIZES.length} standard sizes`);
console.log(`compareSetups: ${fmt(compareRate)} per second`);
console.log(`compareSetups (precomputed geometry): ${fmt(comparePrecomputedRate)} per second`);
console.log(`setupGeometry: ${fmt(geometryRate)} per second`);
console.log(`parseTireSize: ${fmt(parseRate)} per second`);
console.log(`finder: ${finder.ms.toFixed(2)} ms (${fmt(finder.evaluated)} combinations evaluated, ${fmt(finder.matched)} matched)`);
console.log(
  `finder, offsets every 1 mm from -76 to +60: ${finderFine.ms.toFixed(2)} ms (${fmt(finderFine.evaluated)} combinations, ${fmt(finderFine.matched)} matched)`,
);
console.log(`tighteningSequence(32): ${fmt(seqRate)} per second`);
const okCompare = compareRate >= 1_000_000;
const okFinder = finder.ms <= 100;
console.log(`targets: compareSetups ≥ 1,000,000/s ${okCompare ? "met" : "MISSED"}; finder ≤ 100 ms ${okFinder ? "met" : "MISSED"}`);
