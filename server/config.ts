import path from 'node:path';
import { z } from 'zod';

const bool = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');

/** The session secret a fresh checkout runs with; refused in production. */
export const DEFAULT_SESSION_SECRET = 'clearwood-local-session-secret-change-me';

/**
 * `TRUST_PROXY`: which hop's `X-Forwarded-For` to believe. Off by default, so a client cannot
 * choose the address the rate limits count; behind a reverse proxy name it (`loopback`, an
 * address or subnet list, or a hop count).
 */
const trustProxy = z
  .string()
  .trim()
  .min(1)
  .transform((v, ctx): boolean | number | string => {
    if (v === 'false' || v === '0') return false;
    if (v === 'true')
      ctx.addIssue({
        code: 'custom',
        message: 'trusting every proxy lets any client forge its address: name the proxy instead',
      });
    if (/^\d+$/.test(v)) return Number(v);
    return v;
  });

/**
 * `DATABASE_URL`: a PostgreSQL server instead of the SQLite file, for more than one app process
 * (or machine) on one database. Only `postgres://` and `postgresql://` URLs.
 */
const databaseUrl = z
  .string()
  .trim()
  .url()
  .refine((v) => /^postgres(ql)?:\/\//i.test(v), {
    message: 'must be a postgres:// or postgresql:// URL',
  });

/** Empty counts as unset, so `NAME=` in a shell file means "not given". */
const unsetWhenEmpty = <T extends z.ZodType>(schema: T) =>
  z.preprocess((v) => (v === '' ? undefined : v), schema.optional());

/** S3 bucket names: 3–63 lower-case letters, digits, dots and hyphens, starting and ending alike. */
const s3Bucket = z
  .string()
  .regex(
    /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/,
    'must be an S3 bucket name (3–63 characters: a-z, 0-9, . and -)',
  );

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  /** 0 picks a free port (tests). */
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  /** The interface to listen on; every interface when unset. */
  HOST: z.string().trim().min(1).optional(),
  DATABASE_FILE: z.string().min(1).default('data/clearwood.sqlite'),
  /** Empty counts as unset, so `DATABASE_URL=` selects the SQLite file again. */
  DATABASE_URL: z.preprocess((v) => (v === '' ? undefined : v), databaseUrl.optional()),
  /** Connections each app process keeps to PostgreSQL (SQLite always uses one). */
  DATABASE_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
  SESSION_SECRET: z.string().min(16).default(DEFAULT_SESSION_SECRET),
  /** Send cookies only over HTTPS (and send HSTS); off for plain-http local runs. */
  COOKIE_SECURE: bool.default(false),
  /** Seed the demo into an empty database; on by default except in production. */
  SEED_DEMO: bool.optional(),
  MAIL_TRANSPORT: z.enum(['outbox', 'smtp']).default('outbox'),
  SMTP_URL: z.string().url().optional(),
  MAIL_FROM: z.string().default('Clearwood <no-reply@clearwood.example>'),
  /**
   * Unsafe, development only: a web page of the local outbox at `/api/dev/outbox`, answering
   * requests from loopback alone. Anyone who can read it can take over any account.
   */
  DEV_OUTBOX_VIEW: bool.default(false),
  APP_URL: z.string().url().optional(),
  TRUST_PROXY: trustProxy.default(false),
  /** Sign-in attempts per address, and per account, in 15 minutes. */
  LOGIN_RATE_LIMIT: z.coerce.number().int().min(1).default(20),
  /** Largest basemap (MBTiles) upload, in bytes; 200 MiB by default. */
  BASEMAP_MAX_BYTES: z.coerce
    .number()
    .int()
    .min(1)
    .default(200 * 1024 * 1024),
  /** Folder for uploaded basemaps; defaults to `basemaps/` beside the database file. */
  BASEMAP_DIR: z.string().min(1).optional(),
  /** Where photos are kept: `disk` (PHOTO_DIR) or `s3` (an S3 bucket, PHOTO_S3_*). */
  PHOTO_STORAGE: z.enum(['disk', 's3']).default('disk'),
  /** Folder for photos on disk; defaults to `photos/` beside the database file. */
  PHOTO_DIR: z.string().min(1).optional(),
  /** Largest photo upload, in bytes; 10 MiB by default. */
  PHOTO_MAX_BYTES: z.coerce
    .number()
    .int()
    .min(1)
    .default(10 * 1024 * 1024),
  /** Largest CSV import, in bytes; 20 MiB by default (some 300,000 rows). */
  IMPORT_MAX_BYTES: z.coerce
    .number()
    .int()
    .min(1)
    .default(20 * 1024 * 1024),
  /**
   * Tests only, refused in production: a pause in milliseconds after each batch of rows an import
   * writes, so that a crash test can kill the server while an import's transaction is half written.
   */
  IMPORT_WRITE_PAUSE_MS: z.coerce.number().int().min(0).max(1000).default(0),
  /** Folder for `npm run backup`; defaults to `backups/` beside the database file. */
  BACKUP_DIR: z.string().min(1).optional(),
  /** How many backups `npm run backup` keeps (the newest ones). */
  BACKUP_KEEP: z.coerce.number().int().min(1).max(1000).default(14),
  /**
   * A forecast service speaking the open weather-API daily protocol (`…?latitude=&longitude=&daily=`);
   * unset, the season log's coming days come from a stand-in series made on this server.
   */
  FORECAST_URL: unsetWhenEmpty(
    z
      .string()
      .url()
      .refine((v) => /^https?:\/\//i.test(v), { message: 'must be an http:// or https:// URL' }),
  ),
  /** How long to wait for the forecast service, in milliseconds. */
  FORECAST_TIMEOUT_MS: z.coerce.number().int().min(100).max(60_000).default(4000),
  PHOTO_S3_BUCKET: unsetWhenEmpty(s3Bucket),
  PHOTO_S3_REGION: unsetWhenEmpty(
    z.string().regex(/^[a-z]{2}(-[a-z0-9]+)+$|^auto$/, 'must be a region name such as eu-west-1'),
  ),
  /** An S3-compatible service other than AWS (MinIO, a local stand-in): its http(s) URL. */
  PHOTO_S3_ENDPOINT: unsetWhenEmpty(
    z
      .string()
      .url()
      .refine((v) => /^https?:\/\//i.test(v), { message: 'must be an http:// or https:// URL' }),
  ),
  PHOTO_S3_ACCESS_KEY_ID: unsetWhenEmpty(z.string().trim().min(1)),
  PHOTO_S3_SECRET_ACCESS_KEY: unsetWhenEmpty(z.string().trim().min(1)),
  /** Address the bucket in the path (`endpoint/bucket/key`), as most S3 stand-ins need. */
  PHOTO_S3_FORCE_PATH_STYLE: bool.default(false),
  /** Keys start with this (a folder inside a shared bucket). */
  PHOTO_S3_PREFIX: unsetWhenEmpty(
    z.string().regex(/^[A-Za-z0-9._/-]{1,100}$/, 'may hold only letters, digits, ., _, - and /'),
  ),
});

type Parsed = z.infer<typeof envSchema>;

/** Where the data lives: the SQLite file (the default) or a PostgreSQL server. */
export type DatabaseTarget =
  { client: 'sqlite'; filename: string } | { client: 'pg'; url: string; poolMax: number };

/** Where photo files are kept: a folder on this machine, or an S3 bucket. */
export type PhotoStorageConfig =
  | { kind: 'disk'; dir: string }
  | {
      kind: 's3';
      bucket: string;
      region: string;
      endpoint?: string;
      /** Without them the AWS SDK's own chain (environment, profile, instance role) is used. */
      credentials?: { accessKeyId: string; secretAccessKey: string };
      forcePathStyle: boolean;
      prefix: string;
    };

export type Config = Omit<Parsed, 'SEED_DEMO' | 'BASEMAP_DIR' | 'BACKUP_DIR'> & {
  appUrl: string;
  SEED_DEMO: boolean;
  BASEMAP_DIR: string;
  BACKUP_DIR: string;
  database: DatabaseTarget;
  photos: PhotoStorageConfig;
};

/** Parse the environment once; a bad value stops start-up with a message naming each variable. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new ConfigError(`Invalid environment:\n${lines.join('\n')}`);
  }
  const c = parsed.data;
  const production = c.NODE_ENV === 'production';
  const problems: string[] = [];
  if (c.MAIL_TRANSPORT === 'smtp' && !c.SMTP_URL)
    problems.push('SMTP_URL: required when MAIL_TRANSPORT=smtp');
  if (production && c.SESSION_SECRET === DEFAULT_SESSION_SECRET)
    problems.push(
      'SESSION_SECRET: set a secret of your own (at least 16 characters) in production',
    );
  if (production && c.DEV_OUTBOX_VIEW)
    problems.push('DEV_OUTBOX_VIEW: the outbox view is for development only, never in production');
  if (production && c.IMPORT_WRITE_PAUSE_MS > 0)
    problems.push('IMPORT_WRITE_PAUSE_MS: a pause for crash tests, never in production');
  if (c.PHOTO_STORAGE === 's3') {
    if (!c.PHOTO_S3_BUCKET) problems.push('PHOTO_S3_BUCKET: required when PHOTO_STORAGE=s3');
    if (!c.PHOTO_S3_REGION) problems.push('PHOTO_S3_REGION: required when PHOTO_STORAGE=s3');
  }
  if (Boolean(c.PHOTO_S3_ACCESS_KEY_ID) !== Boolean(c.PHOTO_S3_SECRET_ACCESS_KEY))
    problems.push(
      c.PHOTO_S3_ACCESS_KEY_ID
        ? 'PHOTO_S3_SECRET_ACCESS_KEY: required with PHOTO_S3_ACCESS_KEY_ID'
        : 'PHOTO_S3_ACCESS_KEY_ID: required with PHOTO_S3_SECRET_ACCESS_KEY',
    );
  if (problems.length > 0)
    throw new ConfigError(`Invalid environment:\n${problems.map((p) => `  ${p}`).join('\n')}`);
  return {
    ...c,
    SEED_DEMO: c.SEED_DEMO ?? !production,
    appUrl: c.APP_URL ?? `http://localhost:${c.PORT}`,
    BASEMAP_DIR: c.BASEMAP_DIR ?? path.join(path.dirname(c.DATABASE_FILE), 'basemaps'),
    BACKUP_DIR: c.BACKUP_DIR ?? path.join(path.dirname(c.DATABASE_FILE), 'backups'),
    photos: photoStorage(c),
    database: c.DATABASE_URL
      ? { client: 'pg', url: c.DATABASE_URL, poolMax: c.DATABASE_POOL_MAX }
      : { client: 'sqlite', filename: c.DATABASE_FILE },
  };
}

function photoStorage(c: Parsed): PhotoStorageConfig {
  if (c.PHOTO_STORAGE === 'disk')
    return { kind: 'disk', dir: c.PHOTO_DIR ?? path.join(path.dirname(c.DATABASE_FILE), 'photos') };
  return {
    kind: 's3',
    bucket: c.PHOTO_S3_BUCKET!,
    region: c.PHOTO_S3_REGION!,
    ...(c.PHOTO_S3_ENDPOINT ? { endpoint: c.PHOTO_S3_ENDPOINT } : {}),
    ...(c.PHOTO_S3_ACCESS_KEY_ID && c.PHOTO_S3_SECRET_ACCESS_KEY
      ? {
          credentials: {
            accessKeyId: c.PHOTO_S3_ACCESS_KEY_ID,
            secretAccessKey: c.PHOTO_S3_SECRET_ACCESS_KEY,
          },
        }
      : {}),
    forcePathStyle: c.PHOTO_S3_FORCE_PATH_STYLE,
    prefix: c.PHOTO_S3_PREFIX ? `${c.PHOTO_S3_PREFIX.replace(/\/+$/, '')}/` : '',
  };
}

export class ConfigError extends Error {}

/**
 * `TEST_DATABASE_URL`, read by the test helpers only: an admin URL of a PostgreSQL server on which
 * the API tests make (and drop) a database of their own per test app.
 */
export function loadTestDatabaseUrl(env: NodeJS.ProcessEnv = process.env): string | undefined {
  const raw = env.TEST_DATABASE_URL;
  if (raw === undefined || raw.trim() === '') return undefined;
  const parsed = databaseUrl.safeParse(raw);
  if (!parsed.success)
    throw new ConfigError(
      `Invalid environment:\n  TEST_DATABASE_URL: ${parsed.error.issues[0].message}`,
    );
  return parsed.data;
}
