import * as z from 'zod';

/** Environment, parsed and validated once at start; a bad value stops the process with its name. */
const Env = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(1).max(65535).default(4280),
  DATABASE_URL: z.string().regex(/^(mysql|mariadb):\/\//, 'must start with mysql:// or mariadb://'),
  SESSION_SECRET: z.string().min(32, 'must be at least 32 characters'),
  /** SMTP server for outgoing mail; in development and tests a local fake (see mail/). */
  SMTP_URL: z.string().default('smtp://127.0.0.1:2525'),
  MAIL_FROM: z.string().default('Keeperline <no-reply@keeperline.example.test>'),
  PUBLIC_URL: z.string().url().optional(),
  DATA_DIR: z.string().default('.data'),
  DASHBOARD_DIST: z.string().default('dist/dashboard/browser'),
  /** Cookies marked Secure (behind TLS); off on plain loopback HTTP. */
  COOKIE_SECURE: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  SIGNIN_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
  UPLOAD_LIMIT_MB: z.coerce.number().min(1).default(200),
});

export type Config = z.infer<typeof Env> & { publicUrl: string };

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = Env.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const c = parsed.data;
  return { ...c, publicUrl: c.PUBLIC_URL ?? `http://${c.HOST}:${c.PORT}` };
}

/** For tools that only touch the database (migrations, demo loading). */
export function databaseUrlFromEnv(env: NodeJS.ProcessEnv = process.env): string {
  const parsed = Env.shape.DATABASE_URL.safeParse(env.DATABASE_URL);
  if (!parsed.success) throw new Error(`Invalid configuration:\n  DATABASE_URL: ${parsed.error.issues[0].message}`);
  return parsed.data;
}
