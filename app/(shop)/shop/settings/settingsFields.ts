import type { InputHTMLAttributes } from "react";
import type { ShopSettingsInput } from "@/lib/shop/schema";

/** One setting as the form shows it: its field, its label, what kind of input it takes and its hint. */
export interface SettingsField {
  name: keyof ShopSettingsInput;
  label: string;
  hint?: string;
  type?: "tel" | "email";
  inputMode?: InputHTMLAttributes<HTMLInputElement>["inputMode"];
  readOnly?: true;
}

/** The quote header's settings, one per row. */
export const HEADER_FIELDS: readonly SettingsField[] = [
  { name: "name", label: "Shop name" },
  { name: "address", label: "Address", hint: "Printed in the quote header." },
  { name: "phone", label: "Phone", type: "tel" },
  {
    name: "noticeEmail",
    label: "E-mail for shop notices",
    type: "email",
    hint: "Where we tell the shop that a customer accepted, paid or booked. Leave it empty to use the owners' addresses.",
  },
];

/** Rates and terms, two to a row on wider screens. */
export const TERMS_FIELDS: readonly SettingsField[] = [
  { name: "taxRate", label: "Sales tax rate (%)", inputMode: "decimal", hint: "Applied to taxable lines, e.g. 8.25." },
  { name: "depositPct", label: "Deposit (% of total)", inputMode: "numeric" },
  { name: "labourRate", label: "Labour rate ($ per hour)", inputMode: "decimal" },
  {
    name: "fabricationRate",
    label: "Fabrication rate ($ per hour)",
    inputMode: "decimal",
    hint: "Fender trimming and other cutting work.",
  },
  { name: "quoteValidityDays", label: "Quote valid for (days)", inputMode: "numeric" },
  { name: "currency", label: "Currency", readOnly: true, hint: "Quotes and deposits are in US dollars." },
];

/** Every setting's field name: the server's field errors are placed on these. */
export const SETTINGS_FIELD_NAMES = [...HEADER_FIELDS, ...TERMS_FIELDS].map((f) => f.name);
