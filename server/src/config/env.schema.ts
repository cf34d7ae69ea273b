import { z } from 'zod';
import { NODE_ENVS } from './app-config.js';
import { parseDurationSeconds } from './duration.js';

const flag = () => z.stringbool({ error: 'must be true or false (or 1/0, yes/no, on/off)' });

/** The raw environment variables the server reads; empty values count as unset. */
export const envSchema = z.object({
  NODE_ENV: z.enum(NODE_ENVS, { error: `must be one of ${NODE_ENVS.join(', ')}` }).default('development'),
  PORT: z.coerce
    .number({ error: 'must be a whole number from 0 to 65535' })
    .int({ error: 'must be a whole number from 0 to 65535' })
    .min(0, { error: 'must be a whole number from 0 to 65535' })
    .max(65535, { error: 'must be a whole number from 0 to 65535' })
    .default(3000),
  DATA_DIR: z.string().default('data'),
  JWT_SECRET: z.string().min(16, { error: 'must have at least 16 characters' }).optional(),
  JWT_TTL: z
    .string()
    .default('8h')
    .transform((text, ctx) => {
      const seconds = parseDurationSeconds(text);
      if (seconds === undefined) {
        ctx.addIssue({ code: 'custom', message: `must be a duration like 90s, 15m, 8h or 7d (got "${text}")` });
        return z.NEVER;
      }
      return seconds;
    }),
  SMTP_URL: z.url({ protocol: /^smtps?$/, error: 'must be an smtp:// or smtps:// URL' }).optional(),
  SIGNUP_ENABLED: flag().default(true),
  SEED_DEMO: flag().optional(),
  APP_URL: z.url({ protocol: /^https?$/, error: 'must be an http:// or https:// URL' }).optional(),
  CLIENT_DIST: z.string().default('client/dist'),
  CORS_ORIGINS: z.string().optional(),
});
export type Env = z.infer<typeof envSchema>;
