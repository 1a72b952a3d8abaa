export type Cluster = { url: string; port: number; dataDir: string; startedHere: boolean; stop: () => void };
export function findPostgresBin(): string | null;
export function ensurePostgresInstalled(): string;
export function chooseDataDir(preferred: string): string;
export function freePort(): Promise<number>;
export function startCluster(options: { dataDir: string; port: number; durable: boolean; database: string }): Promise<Cluster>;
export function stopCluster(dataDir: string): void;
