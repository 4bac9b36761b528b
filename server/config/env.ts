import { z } from "zod";

/**
 * Environment, parsed once at boot; a bad value stops the server with a message naming it.
 *
 * LINKLEAP_MODE=demo (the default) runs the embedded stack: a private PostgreSQL, the local
 * sign-in provider and the local SMTP server. LINKLEAP_MODE=production needs the real
 * settings below and starts none of them.
 */
const port = (fallback: number) => z.coerce.number().int().min(0).max(65535).default(fallback);
const optionalText = z
  .string()
  .optional()
  .transform((v) => (v?.trim() ? v.trim() : undefined));

export const envSchema = z.object({
  LINKLEAP_MODE: z.enum(["demo", "production"]).default("demo"),
  HOST: z.string().default("127.0.0.1"),
  PORT: port(4300),
  /** The address people use to reach Linkleap (OAuth callback, links in e-mail). */
  PUBLIC_URL: z.url().optional(),
  /** Where the demo keeps its database cluster, mail and secrets; in both modes, uploaded photos (uploads/). */
  LINKLEAP_DATA_DIR: z.string().default(".data"),

  DATABASE_URL: optionalText,
  /** Port of the embedded PostgreSQL (demo mode). */
  PG_PORT: port(4310),

  SESSION_SECRET: optionalText.pipe(z.string().min(32, "must be at least 32 characters").optional()),

  GOOGLE_CLIENT_ID: optionalText,
  GOOGLE_CLIENT_SECRET: optionalText,
  /** Overrides for the identity provider's endpoints; unset means Google's own. */
  GOOGLE_AUTHORIZATION_URL: z.url().optional(),
  GOOGLE_TOKEN_URL: z.url().optional(),
  GOOGLE_USERINFO_URL: z.url().optional(),
  /** Port of the local sign-in provider (demo mode). */
  SIGN_IN_PORT: port(4301),

  SMTP_HOST: optionalText,
  SMTP_PORT: port(587),
  SMTP_SECURE: z.enum(["true", "false"]).default("false").transform((v) => v === "true"),
  SMTP_USER: optionalText,
  SMTP_PASS: optionalText,
  MAIL_FROM: z.string().default("Linkleap <linkleap@localhost>"),
  /** Port of the local SMTP server (demo mode). */
  LOCAL_SMTP_PORT: port(4302),
});
export type Env = z.infer<typeof envSchema>;

const REQUIRED_IN_PRODUCTION = [
  "DATABASE_URL",
  "PUBLIC_URL",
  "SESSION_SECRET",
  "GOOGLE_CLIENT_ID",
  "GOOGLE_CLIENT_SECRET",
  "SMTP_HOST",
] as const;

export function parseEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const result = envSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join("\n")}`);
  }
  const env = result.data;
  if (env.LINKLEAP_MODE === "production") {
    const missing = REQUIRED_IN_PRODUCTION.filter((key) => !env[key]);
    if (missing.length) throw new Error(`LINKLEAP_MODE=production needs: ${missing.join(", ")}`);
  }
  return env;
}
