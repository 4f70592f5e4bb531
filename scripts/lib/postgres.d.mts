// Types for postgres.mjs, for the TypeScript that starts a private cluster of its own (the API's
// fault test, benchmarks).
export interface ClusterOptions {
  dataDir: string;
  port: number;
  database: string;
  fresh?: boolean;
  fast?: boolean;
  /** A throw-away cluster in a new private temporary directory. */
  scratch?: boolean;
}

export interface Cluster {
  host: string;
  port: number;
  user: string;
  password: string;
  database: string;
  url: string;
  dataDir: string;
  createDatabase(name: string): string;
  stop(): void;
  kill(): void;
  start(): Promise<void>;
  remove(): void;
}

export function startCluster(options: ClusterOptions): Promise<Cluster>;
export function portIsFree(port: number, host?: string): Promise<boolean>;
export function ensureSecret(file: string): string;
export function ensurePostgresBinaries(): Promise<string>;
