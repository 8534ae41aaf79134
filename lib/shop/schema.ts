import { z } from "zod";
import { parseMoneyToCents, parsePercentToBp } from "@/lib/shop/quotes/money";
import { emailField } from "../accounts/schema";
import { LINK_TOKEN_RE } from "@/lib/platform/tokenFormat";

/** Shared by the shop forms and route handlers. Money fields are typed in dollars, stored in cents. */
export const moneyField = (label: string, max = 100_000_00) =>
  z
    .string()
    .trim()
    .min(1, `Enter ${label}.`)
    .transform((v, ctx) => {
      const c = parseMoneyToCents(v);
      if (c === null || c < 0 || c > max) {
        ctx.addIssue({ code: "custom", message: `Enter ${label} in dollars, like 125 or 89.50 (0 to ${max / 100}).` });
        return z.NEVER;
      }
      return c;
    });

/** Where the shop's notices go: an address, or empty for the owners' own (a form left without it clears it). */
const noticeEmailField = z
  .string()
  .trim()
  .max(254, "That e-mail address is too long.")
  .pipe(z.union([z.literal(""), z.email("Enter an e-mail address like name@example.com, or leave it empty.")]))
  .default("");

export const shopSettingsSchema = z.object({
  name: z.string().trim().min(1, "Enter the shop's name.").max(120, "Use at most 120 characters."),
  address: z.string().trim().max(300, "Use at most 300 characters."),
  phone: z.string().trim().max(40, "Use at most 40 characters."),
  taxRate: z
    .string()
    .trim()
    .transform((v, ctx) => {
      const bp = parsePercentToBp(v);
      if (bp === null || bp > 3000) {
        ctx.addIssue({ code: "custom", message: "Enter the tax rate in percent, like 8.25 (0 to 30)." });
        return z.NEVER;
      }
      return bp;
    }),
  labourRate: moneyField("an hourly labour rate"),
  fabricationRate: moneyField("an hourly fabrication rate"),
  quoteValidityDays: z.coerce
    .number({ message: "Enter a number of days." })
    .int("Use whole days.")
    .min(1, "At least 1 day.")
    .max(365, "At most 365 days."),
  depositPct: z.coerce
    .number({ message: "Enter a percentage." })
    .int("Use a whole percentage.")
    .min(0, "At least 0 %.")
    .max(100, "At most 100 %."),
  currency: z.literal("USD", "Quotes are in US dollars (USD)."),
  noticeEmail: noticeEmailField,
});
export type ShopSettingsInput = z.input<typeof shopSettingsSchema>;
export type ShopSettings = z.output<typeof shopSettingsSchema>;

/** The invited person's address: the shared e-mail rules, but asking for that person's address, not "your" own. */
export const staffInviteSchema = z.object({
  email: z.string().trim().min(1, "Enter the e-mail address of the person to invite.").pipe(emailField),
});
export type StaffInviteInput = z.infer<typeof staffInviteSchema>;

export const joinShopSchema = z.object({
  token: z.string().regex(LINK_TOKEN_RE, "This invitation link is not valid."),
  name: z.string().trim().max(100, "Use at most 100 characters.").optional(),
  password: z.string().min(1, "Enter a password.").max(200, "Use at most 200 characters."),
});
export type JoinShopInput = z.infer<typeof joinShopSchema>;
