export const NODE_ENVS = ['development', 'production', 'test'] as const;
export type NodeEnv = (typeof NODE_ENVS)[number];

/** The server's configuration, parsed and checked from the environment once at start-up. */
export interface AppConfig {
  nodeEnv: NodeEnv;
  port: number;
  /** Absolute folder for the SQLite database and every other file the server writes. */
  dataDir: string;
  /** PostgreSQL to use instead of SQLite in DATA_DIR (DATABASE_URL); undefined: SQLite. */
  databaseUrl?: string;
  /** JWT_SECRET when set; otherwise the server's own key, generated once and kept in DATA_DIR (auth/signing-key.ts). */
  jwtSecret?: string;
  jwtTtlSeconds: number;
  /** Outgoing mail server; unset means the server runs its own local mail sink. */
  smtpUrl?: string;
  /** Self-registration: SIGNUP_ENABLED, else on only with the invented demo data (SEED_DEMO). */
  signupEnabled: boolean;
  seedDemo: boolean;
  /** Base of links in e-mails. */
  appUrl: string;
  /** Absolute folder of the built client that the server serves. */
  clientDist: string;
  /** Origins allowed by CORS; empty means CORS stays closed (same origin only). */
  corsOrigins: string[];
  /** Proxies in front of the server whose X-Forwarded-For is believed (0: none), so sign-in limits count real client addresses. */
  trustProxyHops: number;
  characterisation: CharacterisationConfig;
}

/** How characterisation jobs run (docs/characterisation.md). */
export interface CharacterisationConfig {
  /** Jobs run at once on this server. */
  concurrency: number;
  /** auto: Debian's ngspice when installed, else the WebAssembly build. */
  engine: 'auto' | 'native' | 'wasm';
  /** A request's grid (all devices together) may hold at most this many points. */
  maxPoints: number;
  /** A running job whose server has not reported for this long is taken over (resumed or failed). */
  leaseSeconds: number;
  /** Runs a job may start (a server stop interrupts one); beyond them it fails. */
  maxAttempts: number;
  /** Simulation worker threads; the machine's cores when undefined. */
  threads?: number;
  /** Decoded tables kept in memory, bytes. */
  tableCacheBytes: number;
  /** Characterise the demo processes in the background at first start (with the demo seed). */
  demo: boolean;
}
