import { z } from "zod";
import { LINK_TOKEN_RE } from "@/lib/platform/tokenFormat";

/**
 * Shared by the forms (react-hook-form resolver) and the route handlers. Every field has a
 * message for every way it can be wrong, a wrong type included (`z.string(message)`), so the
 * validator's own wording never reaches a person, on the page or from the API.
 */
export const emailField = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .min(1, "Enter your e-mail address.")
  .max(254, "That e-mail address is too long.")
  .pipe(z.email("Enter an e-mail address like name@example.com."));

export const passwordField = z
  .string({ error: "Enter a password of at least 10 characters." })
  .min(10, "Use at least 10 characters.")
  .max(200, "Use at most 200 characters.");

export const signUpSchema = z.object({
  name: z.string({ error: "Enter your name." }).trim().min(1, "Enter your name.").max(100, "Use at most 100 characters."),
  email: emailField,
  password: passwordField,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

/** The confirmation page of a sign-up: the link's token and the password chosen on the sign-up form. */
export const confirmSignUpSchema = z.object({
  token: z
    .string({ error: "This sign-up link is not valid. Sign up again." })
    .regex(LINK_TOKEN_RE, "This sign-up link is not valid. Sign up again."),
  password: z
    .string({ error: "Enter the password you chose when signing up." })
    .min(1, "Enter the password you chose when signing up.")
    .max(200, "Use at most 200 characters."),
});
export type ConfirmSignUpInput = z.infer<typeof confirmSignUpSchema>;

export const signInSchema = z.object({
  email: emailField,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password.").max(200, "Use at most 200 characters."),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const forgotPasswordSchema = z.object({ email: emailField });
export type ForgotPasswordInput = z.infer<typeof forgotPasswordSchema>;

export const resetPasswordSchema = z
  .object({
    token: z
      .string({ error: "This reset link is not valid. Ask for a new one." })
      .regex(LINK_TOKEN_RE, "This reset link is not valid. Ask for a new one."),
    password: passwordField,
    confirm: z.string({ error: "Type the new password again." }),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ." });
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;

export const roleChangeSchema = z
  .object({
    role: z.enum(["member", "shop_staff", "shop_owner", "admin"], "Pick one of the roles in the list."),
    shopId: z.uuid("Pick a shop.").nullable().optional(),
  })
  .refine((v) => (v.role === "shop_staff" || v.role === "shop_owner" ? !!v.shopId : true), {
    path: ["shopId"],
    message: "Shop roles need a shop.",
  });
