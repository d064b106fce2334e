import "server-only";
import { z } from "zod";

// Secrets and addresses come only from the environment; a missing or malformed one stops start-up with its name.
const required = () => z.string({ error: (i) => (i.input === undefined ? "is not set" : "must be text") });

const envSchema = z.object({
  DATABASE_URL: required().regex(/^mariadb:\/\//, "DATABASE_URL must be a mariadb:// URL"),
  NEXTAUTH_SECRET: required().min(32, "NEXTAUTH_SECRET must be at least 32 characters"),
  NEXTAUTH_URL: required().pipe(z.url("NEXTAUTH_URL must be the public origin, e.g. http://localhost:3000")),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(2525),
  MAIL_FROM: z.string().default("Loopwright <no-reply@loopwright.invalid>"),
  LOOPWRIGHT_DEV_OUTBOX: z.enum(["0", "1"]).default("0"),
  // How many proxies in front of the app append to x-forwarded-for (0: reached directly); see lib/server/throttle.ts.
  LOOPWRIGHT_TRUSTED_PROXIES: z.coerce.number().int().min(0).max(10).default(0),
});
export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;
export function env(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
    throw new Error(`Loopwright cannot start: the environment is incomplete.\n${lines}`);
  }
  cached = parsed.data;
  return cached;
}
