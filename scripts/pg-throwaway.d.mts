// Types for pg-throwaway.mjs, so TypeScript tests can check the throwaway server npm test uses.
export declare function serverBinariesOnPath(): { name: string; found: string | null }[]
export declare function freePort(): Promise<number>
export declare function packageBinaries(): Promise<{ postgres: string; initdb: string; pg_ctl: string }>
export declare function startThrowawayPostgres(opts?: { log?: (message: string) => void }): Promise<{
  url: string
  port: number
  version: string
  dir: string
  stop: () => Promise<void>
}>
