import type { Knex } from "knex";
import { keyFigureColumns } from "../../lib/comparisons/keyFigures";
import { comparisonInputSchema } from "../../lib/comparisons/schema";
import { parseBoltPattern, parseLength } from "../../lib/fitment";
import { demoPointPicture, demoVehiclePicture } from "../../lib/garage/photos/demoImages";
import { extensionOf, processImage } from "../../lib/garage/photos/image";
import { s3PhotoStore } from "../../lib/garage/photos/s3";
import { setupSchema } from "../../lib/setup/schema";

/**
 * Demo garage of the demo member: two invented vehicles with measured points and drawn photos.
 * Only adds what is missing; photos whose objects are missing from the bucket are uploaded again.
 */
const JUNO = "a1000000-0000-4000-8000-000000000001";
const TIED_COMPARISON = "c4000000-0000-4000-8000-000000000010";
const setup = (s: unknown) => setupSchema.parse(s);

const VEHICLES = [
  {
    id: "d4000000-0000-4000-8000-000000000001",
    name: "Gravel Hauler",
    year: 2009,
    make: "Generic",
    model: "Full-size pickup",
    trim: "Crew cab, long bed",
    front_suspension: "independent",
    bolt: "6x5.5",
    hub_bore_mm: 108,
    stock: setup({
      tire: "265/70R17 113T",
      wheelDiameterIn: 17,
      wheelWidthIn: 7.5,
      position: { mode: "offset", offsetMm: 44 },
      spacerMm: 0,
    }),
    current: setup({
      tire: "LT285/70R17 121/118Q E",
      wheelDiameterIn: 17,
      wheelWidthIn: 8.5,
      position: { mode: "offset", offsetMm: 18 },
      spacerMm: 0,
    }),
    lift_height_mm: parseLength("2-1/2", "in"),
    kingpin_inclination_deg: 12,
    axle_ratio: 3.73,
    transmission_ratio: 0.67,
    notes: "Leveling kit up front. Rubs the liner on the right side at full lock in reverse.",
    picture: { body: "#963711", cab: "pickup" as const, lifted: 30 },
    points: [
      { n: 1, label: "Frame rail, full left lock", direction: "inboard", distance: "1-1/4 in", state: "full-lock" },
      { n: 2, label: "Upper control arm", direction: "inboard", distance: "22 mm", state: "ride-height" },
      { n: 3, label: "Front fender lip", direction: "outboard", distance: "1 in", state: "ride-height" },
      { n: 4, label: "Inner fender liner", direction: "upward", distance: "2 in", state: "full-stuff" },
      { n: 5, label: "Bumper corner, full right lock", direction: "fore-aft", distance: "1-1/2 in", state: "full-lock" },
    ],
  },
  {
    id: "d4000000-0000-4000-8000-000000000002",
    name: "Ridge Runner",
    year: 1998,
    make: "Generic",
    model: "Compact 4x4 wagon",
    trim: null,
    front_suspension: "solid-axle",
    bolt: "5x4.5",
    hub_bore_mm: 71.5,
    stock: setup({ tire: "225/75R15 102S", wheelDiameterIn: 15, wheelWidthIn: 7, position: { mode: "offset", offsetMm: 0 }, spacerMm: 0 }),
    current: setup({
      tire: "31x10.50R15LT 109Q C",
      wheelDiameterIn: 15,
      wheelWidthIn: 8,
      position: { mode: "backspacing", backspacingIn: 3.75, reference: "flange", flangeIn: 0.5 },
      spacerMm: 0,
    }),
    lift_height_mm: parseLength("3 in", "in"),
    kingpin_inclination_deg: null,
    axle_ratio: 4.1,
    transmission_ratio: 0.79,
    notes: "Trail rig. Spare lives on a rear carrier.",
    picture: { body: "#1f4a6f", cab: "wagon" as const, lifted: 45 },
    points: [
      { n: 1, label: "Leaf spring, rear", direction: "inboard", distance: "3/4 in", state: "ride-height" },
      { n: 2, label: "Flare edge", direction: "outboard", distance: "1-3/4 in", state: "ride-height" },
      { n: 3, label: "Fender at full stuff", direction: "upward", distance: "1-1/8 in", state: "full-stuff" },
      { n: 4, label: "Radius arm mount, full lock", direction: "fore-aft", distance: "2 in", state: "full-lock" },
    ],
  },
] as const;

const pointId = (v: number, n: number) => `d4000000-0000-4000-8000-0000000001${v}${n}`;
const photoId = (v: number, n: number) => `d4000000-0000-4000-8000-0000000002${v - 1}${n}`;

export async function seed(knex: Knex): Promise<void> {
  if (!(await knex("users").where({ id: JUNO }).first("id"))) return;
  for (const [vi, v] of VEHICLES.entries()) {
    const bp = parseBoltPattern(v.bolt);
    await knex("vehicles")
      .insert({
        id: v.id,
        user_id: JUNO,
        name: v.name,
        year: v.year,
        make: v.make,
        model: v.model,
        trim: v.trim,
        front_suspension: v.front_suspension,
        bolt_pattern: bp.text,
        bolt_pcd_mm: bp.pcdMm,
        bolt_count: bp.boltCount,
        hub_bore_mm: v.hub_bore_mm,
        stock_setup: JSON.stringify(v.stock),
        current_setup: JSON.stringify(v.current),
        lift_height_mm: v.lift_height_mm,
        kingpin_inclination_deg: v.kingpin_inclination_deg,
        axle_ratio: v.axle_ratio,
        transmission_ratio: v.transmission_ratio,
        notes: v.notes,
      })
      .onConflict("id")
      .ignore();
    for (const p of v.points) {
      await knex("vehicle_clearances")
        .insert({
          id: pointId(vi + 1, p.n),
          vehicle_id: v.id,
          label: p.label,
          direction: p.direction,
          distance_mm: parseLength(p.distance, "in"),
          distance_text: p.distance,
          suspension_state: p.state,
          measured_setup: JSON.stringify(v.current),
        })
        .onConflict("id")
        .ignore();
    }
  }
  try {
    await seedPhotos(knex);
  } catch (e) {
    console.warn(`demo photos skipped — the photo store is not reachable (${(e as Error).message}). Start it with scripts/start.sh.`);
  }
}

async function seedPhotos(knex: Knex) {
  const store = s3PhotoStore();
  for (const [vi, v] of VEHICLES.entries()) {
    const wanted = [
      {
        id: photoId(vi + 1, 1),
        clearance: null as string | null,
        name: `${v.name} side view.jpg`,
        make: () => demoVehiclePicture(`${v.name} — ${v.year} ${v.model.toLowerCase()}`, v.picture),
      },
      ...v.points.slice(0, 2).map((p) => ({
        id: photoId(vi + 1, p.n + 1),
        clearance: pointId(vi + 1, p.n),
        name: `${p.label}.png`,
        make: () => demoPointPicture(p.label, p.distance),
      })),
    ];
    for (const w of wanted) {
      const row = await knex("vehicle_photos").where({ id: w.id }).first("object_key", "thumb_key");
      if (row && (await store.exists(row.object_key)) && (await store.exists(row.thumb_key))) continue;
      const img = await processImage(await w.make());
      const objectKey = `vehicles/${v.id}/${w.id}.${extensionOf(img.type)}`;
      const thumbKey = `vehicles/${v.id}/${w.id}-thumb.webp`;
      await store.put(objectKey, img.full, img.type);
      await store.put(thumbKey, img.thumb, "image/webp");
      await knex("vehicle_photos")
        .insert({
          id: w.id,
          vehicle_id: v.id,
          clearance_id: w.clearance,
          object_key: objectKey,
          thumb_key: thumbKey,
          content_type: img.type,
          width: img.width,
          height: img.height,
          bytes: img.full.length,
          original_name: w.name,
        })
        .onConflict("id")
        .merge();
    }
  }
  // A saved comparison tied to the first vehicle: its install checklist opens from the list.
  const hauler = VEHICLES[0]!;
  if (!(await knex("comparisons").where({ id: TIED_COMPARISON }).first("id"))) {
    const input = comparisonInputSchema.parse({
      current: hauler.current,
      planned: {
        tire: "35x12.50R17LT 121Q LRE",
        wheelDiameterIn: 17,
        wheelWidthIn: 9,
        position: { mode: "offset", offsetMm: -12 },
        spacerMm: 0,
      },
      vehicle: {
        kingpinInclinationDeg: hauler.kingpin_inclination_deg,
        axleRatio: hauler.axle_ratio,
        transmissionRatio: hauler.transmission_ratio,
        cruiseSpeedsMph: [60, 70],
        fenderLineMm: null,
      },
    });
    await knex("comparisons").insert({
      id: TIED_COMPARISON,
      owner_id: JUNO,
      name: "Gravel Hauler — 35s on 17x9",
      vehicle_id: hauler.id,
      input: JSON.stringify(input),
      ...keyFigureColumns(input),
    });
  }
}
