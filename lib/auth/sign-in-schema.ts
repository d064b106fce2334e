import { z } from "zod";

// What the sign-in form sends; checked in the form and again by the server before any lookup.
export const signInSchema = z.object({ email: z.email("Enter a valid e-mail address").max(254), password: z.string().min(1, "Enter your password").max(200) });
export type SignInInput = z.infer<typeof signInSchema>;
