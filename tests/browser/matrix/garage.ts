import { call } from "../support/http";
import type { MatrixCase } from "./types";

// Every signed-in person keeps a garage of their own (shop staff and owners too: lib/garage/access.ts).
// Rows of the demo member (db/seeds/04_demo_garage.ts) are "not found" for everyone else — never
// 403; only admins may look at a member's photos.
const DEMO_VEHICLE = "d4000000-0000-4000-8000-000000000001";
const DEMO_PHOTO = "d4000000-0000-4000-8000-000000000201";
/** `status` for the demo member, `others` for shop staff, shop owner and admin (`admin` when the admin differs). */
const garage = (status: number, others = status, admin = others) => ({
  anonymous: 401,
  member: status,
  shop_staff: others,
  shop_owner: others,
  admin,
});

const SETUP = { tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 };
const VEHICLE = {
  name: "Matrix test rig",
  frontSuspension: "solid-axle",
  boltPattern: "5x4.5",
  stockSetup: SETUP,
  currentSetup: SETUP,
};

/** A throw-away vehicle of the demo member (for the rows that change or delete it). */
async function scratchVehicle(): Promise<string> {
  const res = await call("member", "POST", "/api/vehicles", VEHICLE);
  if (res.status !== 201) throw new Error(`could not create a scratch vehicle: ${res.status}`);
  return ((await res.json()) as { vehicle: { id: string } }).vehicle.id;
}

async function scratchClearance(): Promise<string> {
  const id = await scratchVehicle();
  const res = await call("member", "POST", `/api/vehicles/${id}/clearances`, {
    label: "frame rail",
    direction: "inboard",
    distance: "1 in",
    suspensionState: "ride-height",
  });
  const c = ((await res.json()) as { clearance: { id: string } }).clearance.id;
  return `/api/vehicles/${id}/clearances/${c}`;
}

export const cases: MatrixCase[] = [
  { route: "/api/vehicles", method: "GET", path: "/api/vehicles", expect: garage(200) },
  {
    route: "/api/vehicles",
    method: "POST",
    path: "/api/vehicles",
    body: { ...VEHICLE, boltPattern: "nope" },
    expect: garage(422),
    note: "invalid input",
  },
  {
    route: "/api/vehicles/[id]",
    method: "GET",
    path: `/api/vehicles/${DEMO_VEHICLE}`,
    expect: garage(200, 404),
    note: "the member's vehicle",
  },
  {
    route: "/api/vehicles/[id]",
    method: "PATCH",
    path: `/api/vehicles/${DEMO_VEHICLE}`,
    body: { ...VEHICLE, name: "" },
    expect: garage(422, 422),
    note: "invalid body refused before the lookup",
  },
  {
    route: "/api/vehicles/[id]",
    method: "DELETE",
    path: async () => `/api/vehicles/${await scratchVehicle()}`,
    expect: garage(200, 404),
    note: "member deletes first, then it is gone",
  },
  {
    route: "/api/vehicles/[id]/load",
    method: "GET",
    path: `/api/vehicles/${DEMO_VEHICLE}/load`,
    expect: garage(200, 404),
    note: "the member's vehicle's placard and body points",
  },
  {
    route: "/api/vehicles/[id]/load",
    method: "PUT",
    path: `/api/vehicles/${DEMO_VEHICLE}/load`,
    body: { units: "metric", frontAxleKg: "heavy" },
    expect: garage(422, 422),
    note: "invalid body refused before the lookup",
  },
  {
    route: "/api/vehicles/[id]/load",
    method: "DELETE",
    path: async () => `/api/vehicles/${await scratchVehicle()}/load`,
    expect: garage(200, 404),
    note: "a scratch vehicle of the member's",
  },
  {
    route: "/api/vehicles/[id]/clearances",
    method: "POST",
    path: `/api/vehicles/${DEMO_VEHICLE}/clearances`,
    body: { label: "no unit", direction: "upward", distance: "3", suspensionState: "full-stuff" },
    expect: garage(422, 422),
    note: "a distance without a unit",
  },
  { route: "/api/vehicles/[id]/clearances/[clearanceId]", method: "DELETE", path: scratchClearance, expect: garage(200, 404) },
  {
    route: "/api/vehicles/[id]/photos",
    method: "POST",
    path: `/api/vehicles/${DEMO_VEHICLE}/photos`,
    body: { file: "not multipart" },
    expect: garage(415, 404),
    note: "JSON instead of multipart; only the member owns the vehicle",
  },
  {
    route: "/api/vehicles/[id]/checklist",
    method: "GET",
    path: `/api/vehicles/${DEMO_VEHICLE}/checklist?pt=35x12.50R17LT&pd=17&pw=9&po=-12`,
    expect: garage(200, 404),
  },
  {
    route: "/api/vehicles/[id]/checklist",
    method: "PUT",
    path: `/api/vehicles/${DEMO_VEHICLE}/checklist`,
    body: {
      planned: { ...SETUP, tire: "35x12.50R17LT", wheelWidthIn: 9, position: { mode: "offset", offsetMm: -12 } },
      ticked: ["not-an-item"],
    },
    expect: garage(422, 404),
    note: "an item that is not on the list; only the member owns the vehicle",
  },
  {
    route: "/api/photos/[id]",
    method: "GET",
    path: `/api/photos/${DEMO_PHOTO}?variant=thumb`,
    expect: garage(200, 404, 200),
    note: "the owner and admins see photos",
  },
  {
    route: "/api/photos/[id]",
    method: "DELETE",
    path: "/api/photos/d4000000-0000-4000-8000-0000000009ff",
    expect: garage(404, 404),
    note: "no such photo",
  },
];
