import { z } from "zod";
import { roles } from "@/lib/auth/permissions";
import { passwordSchema } from "@/lib/auth/password";

// Request bodies of the members and invitation API, shared by the forms, the route handlers and the OpenAPI document.

export const inviteSchema = z.strictObject({ email: z.email("Enter a valid e-mail address").max(254), role: z.enum(roles) });
export type InviteInput = z.infer<typeof inviteSchema>;

export const acceptSchema = z.strictObject({ token: z.string().min(20).max(200), name: z.string().trim().min(1, "Enter your name").max(200), password: passwordSchema });
export type AcceptInput = z.infer<typeof acceptSchema>;

export const roleChangeSchema = z.strictObject({ role: z.enum(roles) });
export type RoleChangeInput = z.infer<typeof roleChangeSchema>;

/** Accepting as an account that already exists: signed in as it, only the token is sent (no password changes). */
export const joinSchema = z.strictObject({ token: z.string().min(20).max(200) });
export type JoinInput = z.infer<typeof joinSchema>;
