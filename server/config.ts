import path from 'node:path';
import { z } from 'zod';

const bool = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  /** 0 picks a free port (tests). */
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  DATABASE_FILE: z.string().min(1).default('data/clearwood.sqlite'),
  SESSION_SECRET: z.string().min(16).default('clearwood-local-session-secret-change-me'),
  /** Send cookies only over HTTPS; off for plain-http local runs. */
  COOKIE_SECURE: bool.default(false),
  SEED_DEMO: bool.default(true),
  MAIL_TRANSPORT: z.enum(['outbox', 'smtp']).default('outbox'),
  SMTP_URL: z.string().url().optional(),
  MAIL_FROM: z.string().default('Clearwood <no-reply@clearwood.example>'),
  APP_URL: z.string().url().optional(),
  LOGIN_RATE_LIMIT: z.coerce.number().int().min(1).default(20),
  /** Largest basemap (MBTiles) upload, in bytes; 200 MiB by default. */
  BASEMAP_MAX_BYTES: z.coerce
    .number()
    .int()
    .min(1)
    .default(200 * 1024 * 1024),
  /** Folder for uploaded basemaps; defaults to `basemaps/` beside the database file. */
  BASEMAP_DIR: z.string().min(1).optional(),
});

export type Config = z.infer<typeof envSchema> & { appUrl: string; BASEMAP_DIR: string };

/** Parse the environment once; a bad value stops start-up with a message naming each variable. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new ConfigError(`Invalid environment:\n${lines.join('\n')}`);
  }
  const c = parsed.data;
  if (c.MAIL_TRANSPORT === 'smtp' && !c.SMTP_URL) {
    throw new ConfigError('Invalid environment:\n  SMTP_URL: required when MAIL_TRANSPORT=smtp');
  }
  return {
    ...c,
    appUrl: c.APP_URL ?? `http://localhost:${c.PORT}`,
    BASEMAP_DIR: c.BASEMAP_DIR ?? path.join(path.dirname(c.DATABASE_FILE), 'basemaps'),
  };
}

export class ConfigError extends Error {}
