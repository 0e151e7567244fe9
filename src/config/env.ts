import { z } from 'zod';

const envSchema = z.object({
  /** Where the API lives; same origin by default, so the session cookie travels with requests. */
  VITE_API_BASE_URL: z
    .string()
    .regex(/^(\/|https?:\/\/)/, 'Use a path starting with / or a full http(s) address')
    .default('/api'),
  MODE: z.string().default('production'),
});

function parseEnv() {
  const result = envSchema.safeParse(import.meta.env);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `- ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Clearwood's client settings are invalid:\n${lines.join('\n')}`);
  }
  return {
    apiBaseUrl: result.data.VITE_API_BASE_URL.replace(/\/$/, ''),
    mode: result.data.MODE,
  };
}

export const env = parseEnv();
