import type { AppConfig } from './app-config.js';
import { ConfigError, type ConfigProblem } from './config-error.js';
import { envSchema, type Env } from './env.schema.js';
import { fromRepoRoot } from './paths.js';

export type EnvSource = Record<string, string | undefined>;

/** Parses and checks the environment; throws a ConfigError naming every bad variable. */
export function loadConfig(source: EnvSource = process.env): AppConfig {
  const parsed = envSchema.safeParse(withoutEmptyValues(source));
  if (!parsed.success) {
    throw new ConfigError(
      parsed.error.issues.map((issue) => ({ variable: String(issue.path[0] ?? 'environment'), message: issue.message })),
    );
  }
  const env = parsed.data;
  const seedDemo = env.SEED_DEMO ?? env.NODE_ENV !== 'production';
  const problems = productionProblems(env);
  if (problems.length > 0) throw new ConfigError(problems);

  return {
    nodeEnv: env.NODE_ENV,
    port: env.PORT,
    dataDir: fromRepoRoot(env.DATA_DIR),
    databaseUrl: env.DATABASE_URL,
    jwtSecret: env.JWT_SECRET,
    jwtTtlSeconds: env.JWT_TTL,
    smtpUrl: env.SMTP_URL,
    // Open sign-up only where the invented demo invites visitors in; a team's server opts in explicitly.
    signupEnabled: env.SIGNUP_ENABLED ?? seedDemo,
    seedDemo,
    appUrl: (env.APP_URL ?? `http://localhost:${env.PORT}`).replace(/\/+$/, ''),
    clientDist: fromRepoRoot(env.CLIENT_DIST),
    corsOrigins: (env.CORS_ORIGINS ?? '').split(',').map((o) => o.trim()).filter(Boolean),
    trustProxyHops: env.TRUST_PROXY,
    characterisation: {
      concurrency: env.CHARACTERISATION_CONCURRENCY,
      engine: env.CHARACTERISATION_ENGINE,
      maxPoints: env.CHARACTERISATION_MAX_POINTS,
      leaseSeconds: env.CHARACTERISATION_LEASE_SECONDS,
      maxAttempts: env.CHARACTERISATION_MAX_ATTEMPTS,
      threads: env.SIMULATION_THREADS,
      tableCacheBytes: env.TABLE_CACHE_MB * 1024 * 1024,
      // Tests start many servers: none characterises the demo unless it asks.
      demo: seedDemo && (env.DEMO_CHARACTERISATION ?? env.NODE_ENV !== 'test'),
    },
  };
}

/** Development conveniences that must never reach a production server. */
function productionProblems(env: Env): ConfigProblem[] {
  if (env.NODE_ENV !== 'production') return [];
  const problems: ConfigProblem[] = [];
  if (env.JWT_SECRET === undefined) {
    // Outside production the server keeps a generated key in DATA_DIR; a production deployment names its own,
    // so that every instance and every restore of the data shares it on purpose.
    problems.push({ variable: 'JWT_SECRET', message: 'set a secret of your own (at least 32 characters) when NODE_ENV=production' });
  } else if (env.JWT_SECRET.length < 32) {
    problems.push({ variable: 'JWT_SECRET', message: 'must have at least 32 characters when NODE_ENV=production' });
  }
  if (env.SEED_DEMO === true) {
    problems.push({ variable: 'SEED_DEMO', message: 'the demo accounts share a published password; seeding them is refused when NODE_ENV=production' });
  }
  return problems;
}

function withoutEmptyValues(source: EnvSource): EnvSource {
  return Object.fromEntries(Object.entries(source).filter(([, value]) => value !== undefined && value.trim() !== ''));
}
