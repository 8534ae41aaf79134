import type { Knex } from "knex";
import { keyFigureColumns } from "../../lib/comparisons/keyFigures";
import { DEFAULT_INPUT } from "../../lib/comparisons/model";
import { type ComparisonInput, comparisonInputSchema } from "../../lib/comparisons/schema";
import { randomToken } from "../../lib/platform/tokens";

/**
 * Saved comparisons for the demo member (invented builds). The third has a live share link
 * (a fresh random slug the first time the seed runs). Only adds what is missing.
 */
const JUNO = "a1000000-0000-4000-8000-000000000001";

export const DEMO_COMPARISONS: { id: string; name: string; input: ComparisonInput; shared: boolean }[] = [
  {
    id: "c4000000-0000-4000-8000-000000000001",
    name: "Wagon daily — 33s on the stock 16s",
    shared: false,
    input: {
      current: { tire: "245/75R16 111S", wheelDiameterIn: 16, wheelWidthIn: 7, position: { mode: "offset", offsetMm: 31 }, spacerMm: 0 },
      planned: {
        tire: "285/75R16LT 126/123Q LRE",
        wheelDiameterIn: 16,
        wheelWidthIn: 8,
        position: { mode: "backspacing", backspacingIn: 4.5, reference: "flange", flangeIn: 0.5 },
        spacerMm: 0,
      },
      vehicle: {
        kingpinInclinationDeg: 8,
        axleRatio: 3.73,
        transmissionRatio: 1,
        cruiseSpeedsMph: [60, 70],
        fenderLineMm: null,
        firstGearRatio: null,
        transferLowRatio: null,
      },
    },
  },
  {
    id: "c4000000-0000-4000-8000-000000000002",
    name: "Camp trailer tow rig — 35s",
    shared: false,
    input: {
      current: {
        tire: "LT275/70R18 125/122S LRE",
        wheelDiameterIn: 18,
        wheelWidthIn: 8,
        position: { mode: "offset", offsetMm: 18 },
        spacerMm: 0,
      },
      planned: {
        tire: "35x12.50R18LT 123Q LRE",
        wheelDiameterIn: 18,
        wheelWidthIn: 9,
        position: { mode: "offset", offsetMm: 0 },
        spacerMm: 0,
      },
      vehicle: {
        kingpinInclinationDeg: null,
        axleRatio: 3.55,
        transmissionRatio: 0.69,
        cruiseSpeedsMph: [62, 70],
        fenderLineMm: 150,
        firstGearRatio: null,
        transferLowRatio: null,
      },
    },
  },
  {
    id: "c4000000-0000-4000-8000-000000000003",
    name: "Rock crawler — 37s on beadlocks",
    shared: true,
    input: {
      // The build the workspace opens with, on a rig with its own figures.
      current: DEFAULT_INPUT.current,
      planned: DEFAULT_INPUT.planned,
      vehicle: {
        kingpinInclinationDeg: 9,
        axleRatio: 4.1,
        transmissionRatio: 1,
        cruiseSpeedsMph: [55, 65],
        fenderLineMm: 140,
        firstGearRatio: 3.59,
        transferLowRatio: 4,
      },
    },
  },
];

export async function seed(knex: Knex): Promise<void> {
  const juno = await knex("users").where({ id: JUNO }).first("id");
  if (!juno) return;
  for (const c of DEMO_COMPARISONS) {
    const input = comparisonInputSchema.parse(c.input);
    const exists = await knex("comparisons").where({ id: c.id }).first("id");
    if (!exists) {
      await knex("comparisons").insert({
        id: c.id,
        owner_id: JUNO,
        name: c.name,
        input: JSON.stringify(input),
        ...keyFigureColumns(input),
      });
    }
    if (c.shared) {
      const everShared = await knex("comparison_shares").where({ comparison_id: c.id }).first("id");
      if (!everShared) await knex("comparison_shares").insert({ comparison_id: c.id, slug: randomToken(18) });
    }
  }
}
