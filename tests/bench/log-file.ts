/** The benchmark drive log: 2 h at 50 Hz from the seeded generator, written once to a temp file. */
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { pipeline } from 'node:stream/promises'
import { Readable } from 'node:stream'
import { generateLogChunks } from '@/tests/support/log-generator'
import type { IngestOptions } from '@/app/_lib/reports/log-ingest'

export const LOG_SEED = 20_240_601
export const LOG_DURATION_S = 2 * 3600
export const LOG_RATE_HZ = 50

/** What the upload path passes for a drive map (log-jobs.ts): header mapping none, wheel radius, map axes, kind, surface. */
export const INGEST_OPTIONS: IngestOptions = {
  wheelRadiusM: 0.5,
  map: { rowAxis: [0, 5, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100], colAxis: [0, 3, 6, 10, 15, 20, 30, 40, 50, 60, 70, 80, 90] },
  kind: 'drive',
  surface: 'wet-asphalt',
}

/** Writes the log to a new temp file; returns its path, size and a remover. */
export async function writeBenchLog(): Promise<{ file: string; bytes: number; remove: () => void }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'mapwright-bench-log-'))
  const file = path.join(dir, 'drive-2h-50hz.csv')
  await pipeline(Readable.from(generateLogChunks({ seed: LOG_SEED, durationS: LOG_DURATION_S, rateHz: LOG_RATE_HZ })), fs.createWriteStream(file))
  return { file, bytes: fs.statSync(file).size, remove: () => fs.rmSync(dir, { recursive: true, force: true }) }
}
