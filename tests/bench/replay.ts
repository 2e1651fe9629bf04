/**
 * Replay: the 2-hour, 50 Hz benchmark log read once and replayed through two sets of the demo tipper
 * (the drive map as driven, and a candidate 20 % stronger with its own ramps), as the replay route
 * does (`ingestLog` with `onSample` feeding the replayer); against the same read without a replay,
 * interleaved in one run. Target: under 2 s for the 2-hour log (issue: replay on the server).
 */
import fs from 'node:fs'
import { ingestLog } from '@/app/_lib/reports/log-ingest'
import { demoTipper } from '@/db/demo/programs'
import { demoDriveTable, demoRegenTable } from '@/db/demo/maps'
import { starterRamps } from '@/maps/ramps'
import { createReplayer } from '@/physics/replay'
import { writeBenchLog } from './log-file'
import { figure, isMain, median, now, runStandalone, type BenchResult } from './report'

const BENCH = 'replay'
const ROUNDS = 3

export async function runReplay(): Promise<BenchResult> {
  const log = await writeBenchLog()
  const drive = demoDriveTable(demoTipper, { gamma: 1.4, share: 0.9 })
  const regen = demoRegenTable(demoTipper, { liftOffNm: 400, maxNm: 1800 })
  const stronger = { ...drive, values: drive.values.map((r) => r.map((v) => v * 1.2)) }
  const read = { wheelRadiusM: demoTipper.wheelRadiusM, surface: 'wet-asphalt' as const, calibrateRadius: false, maxSeriesPoints: 10 }
  const once = async (withReplay: boolean) => {
    const t0 = now()
    const r = withReplay
      ? createReplayer({ driven: { drive, regen, ramps: null }, candidate: { drive: stronger, regen, ramps: starterRamps(demoTipper.motorPeakTorqueNm), vehicle: demoTipper }, surface: 'wet-asphalt', loadCase: 'laden' })
      : null
    const res = await ingestLog(fs.createReadStream(log.file), r ? { ...read, onSample: (s, k) => r.push({ timeS: s.timeS, roadSpeedKmh: s.roadSpeedKmh, accelPedalPct: s.accelPedalPct, brakePedalPct: s.brakePedalPct, measuredSlip: k }) } : read)
    const out = r?.finish()
    return { ms: now() - t0, rows: res.samples, more: out?.moreShare ?? 0 }
  }
  try {
    await once(true) // warm the page cache and the code paths
    const plain: number[] = []
    const replay: number[] = []
    let rows = 0
    let more = 0
    for (let i = 0; i < ROUNDS; i++) {
      plain.push((await once(false)).ms)
      const r = await once(true)
      replay.push(r.ms)
      rows = r.rows
      more = r.more
    }
    return {
      bench: BENCH,
      figures: [
        figure(BENCH, 'read + replay, 2 h at 50 Hz', median(replay) / 1000, 's', { op: '<', limit: 2 }, `median of ${ROUNDS}; ${rows} samples; candidate asks for more ${(100 * more).toFixed(1)} % of the time`),
        figure(BENCH, 'read + analysis alone', median(plain) / 1000, 's', undefined, `median of ${ROUNDS}, interleaved`),
        figure(BENCH, 'replay / read alone', median(replay) / median(plain), '×'),
      ],
    }
  } finally { log.remove() }
}

if (isMain(import.meta.url)) void runStandalone(BENCH, runReplay)
