import { z } from "zod";
import { passwordSchema } from "./password";
import { organisationNameSchema } from "@/lib/organisation/settings-schema";

// Sign-up and e-mail confirmation: shared by the public forms, their route handlers and the OpenAPI document.

const email = z.email("Enter a valid e-mail address").max(254, "Use at most 254 characters");
/** A single-use link's token as it appears in the e-mailed address (base64url). */
export const linkTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{20,200}$/, "This link is not valid. Open it again from the e-mail.");

export const signUpSchema = z.strictObject({
  organisationName: organisationNameSchema,
  name: z.string().trim().min(1, "Enter your name").max(200, "Use at most 200 characters"),
  email,
  password: passwordSchema,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const confirmEmailSchema = z.strictObject({ token: linkTokenSchema });
export type ConfirmEmailInput = z.infer<typeof confirmEmailSchema>;

/** "Send the link again" and "forgot password" name only an address. */
export const emailOnlySchema = z.strictObject({ email });
export type EmailOnlyInput = z.infer<typeof emailOnlySchema>;

export const resetPasswordSchema = z.strictObject({ token: linkTokenSchema, password: passwordSchema });
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;

export const changePasswordSchema = z
  .strictObject({ currentPassword: z.string().min(1, "Enter your current password").max(200), newPassword: passwordSchema })
  .refine((v) => v.currentPassword !== v.newPassword, { path: ["newPassword"], message: "Choose a password different from the current one" });
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

/** What sign-in says to an account whose address is not confirmed yet (only after the right password). */
export const UNCONFIRMED_EMAIL = "Confirm your e-mail address first: open the link in the message we sent you. No message? Send the link again below.";
