/**
 * Slip sweep: predicted slip for every cell of a 32 × 32 drive map, 5 surfaces × 4 load cases
 * (20,480 slip solves) through physics `slipGrid`, against the cost of one Magic Formula evaluation
 * measured in the same run (interleaved rounds, medians).
 */
import { demoTractor } from '@/db/demo/programs'
import { loadCasesFor, magicFormula, slipForForceRatio, slipGrid, SURFACE_IDS, SURFACES, type SolveStats } from '@/physics'
import { figure, isMain, median, now, runStandalone, type BenchResult } from './report'
import { mulberry32 } from '@/physics/random'
import { seededDriveMap } from './seeded'

const BENCH = 'slip-sweep'
const SIZE = 32
const ROUNDS = 31
const MF_BATCH = 200_000

export async function runSlipSweep(): Promise<BenchResult> {
  const vehicle = demoTractor
  const map = seededDriveMap(vehicle, SIZE, 0x5eed)
  const loadCases = loadCasesFor(vehicle)
  if (loadCases.length !== 4) throw new Error(`expected 4 load cases, got ${loadCases.length}`)
  const solves = SURFACE_IDS.length * loadCases.length * SIZE * SIZE

  const sweep = (): number => {
    let spins = 0
    for (const surface of SURFACE_IDS)
      for (const loadCase of loadCases)
        for (const row of slipGrid({ vehicle, loadCase, surface, ...map })) for (const c of row) if (c.spin) spins++
    return spins
  }

  // The force ratios the sweep solves, to count Magic Formula evaluations per solve.
  const stats: SolveStats = { solves: 0, mfEvaluations: 0 }
  for (const surface of SURFACE_IDS)
    for (const loadCase of loadCases)
      for (const row of slipGrid({ vehicle, loadCase, surface, ...map }))
        for (const c of row) if (c.driveAxleLoadN > 0) slipForForceRatio(c.wheelForceN / c.driveAxleLoadN, SURFACES[surface].passengerCarCoeffs, stats)

  // Magic Formula inputs: seeded slips across the rising branch and beyond, over all surfaces.
  const rnd = mulberry32(7)
  const slips = Float64Array.from({ length: 4096 }, () => rnd() * 0.4)
  const coeffs = SURFACE_IDS.map((s) => SURFACES[s].passengerCarCoeffs)
  let sink = 0
  const mfBatch = (): number => {
    const t0 = now()
    for (let i = 0; i < MF_BATCH; i++) sink += magicFormula(slips[i & 4095], coeffs[i % 5])
    return ((now() - t0) * 1e6) / MF_BATCH // ns per evaluation
  }

  // The first sweep of the process (cold: parse, JIT), then warm up both, then interleave.
  const c0 = now()
  sink += sweep()
  const coldMs = now() - c0
  for (let i = 0; i < 5; i++) { sink += sweep(); mfBatch() }
  const sweepMs: number[] = []
  const mfNs: number[] = []
  for (let i = 0; i < ROUNDS; i++) {
    const t0 = now()
    sink += sweep()
    sweepMs.push(now() - t0)
    mfNs.push(mfBatch())
  }
  if (!Number.isFinite(sink)) throw new Error('unreachable')

  const sweepMedian = median(sweepMs)
  const perSolveNs = (sweepMedian * 1e6) / solves
  const mf = median(mfNs)
  const evalsPerSolve = stats.mfEvaluations / stats.solves
  return {
    bench: BENCH,
    figures: [
      figure(BENCH, 'sweep time (20,480 solves)', sweepMedian, 'ms', { op: '<', limit: 20 }, `median of ${ROUNDS}`),
      figure(BENCH, 'first sweep of the process (cold)', coldMs, 'ms', undefined, 'includes JIT warm-up; not a target'),
      figure(BENCH, 'time per solve', perSolveNs, 'ns', undefined, 'whole cell: envelope, load transfer, slip'),
      figure(BENCH, 'time per Magic Formula evaluation', mf, 'ns'),
      figure(BENCH, 'solve cost in MF evaluations (time)', perSolveNs / mf, 'evaluations', { op: '<=', limit: 8 }),
      figure(BENCH, 'solve cost in MF evaluations (count)', evalsPerSolve, 'evaluations', { op: '<=', limit: 8 }, `${stats.mfEvaluations} over ${stats.solves} solves`),
    ],
  }
}

if (isMain(import.meta.url)) void runStandalone(BENCH, runSlipSweep)
