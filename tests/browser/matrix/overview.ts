import { type MatrixCase, only } from "./types";

export const cases: MatrixCase[] = [
  {
    route: "/api/shop/overview",
    method: "GET",
    path: "/api/shop/overview",
    expect: only(["shop_owner"]),
    note: "the owner's figures: staff are refused",
  },
];
