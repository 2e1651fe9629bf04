/** Server-side drive-log ingest: streaming CSV parse feeding the pure analyser in `physics/drive-log`. */
import 'server-only'
export { ingestLog, type IngestOptions, type ReopenableLogSource } from './parse-log'
export { ingestLogText } from './ingest-text'
export type { LogIngestResult, LogReadOptions } from './row-sink'
export type { LogByteSource } from './text-source'
