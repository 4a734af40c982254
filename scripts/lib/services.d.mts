// Types for services.mjs (plain Node, so it runs before node_modules exists), for the TypeScript
// scripts and suites that import it.
import type { SpawnSyncReturns } from 'node:child_process';

export const ROOT: string;
export const DATA: string;
export function log(msg: string): void;
export function fail(msg: string): never;
export function checkNode(): void;
export function ensureNpmDeps(): void;
export function ensureWorkspacePackages(): void;
export function ensureDebianPackages(pkgs: Record<string, string>): void;
export interface PostgresServer {
  url(db: string): string;
  superUrl: string;
  startedHere: boolean;
  stop(): void;
}
export function startPostgres(opts: { name: string; port: number; fast?: boolean; databases: string[] }): Promise<PostgresServer>;
export interface RedisServer {
  url: string;
  startedHere: boolean;
  stop(): void;
}
export function startRedis(opts: { name: string; port: number; durable?: boolean }): Promise<RedisServer>;
export function runTs(script: string, args: string[], env?: NodeJS.ProcessEnv): SpawnSyncReturns<Buffer>;
export function isStale(target: string, srcDirs: string[]): boolean;
