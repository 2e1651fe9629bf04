// Streaming ingest from real stream objects: the result must not depend on where the bytes are split.
import { Readable } from 'node:stream'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ingestLog, ingestLogText, type IngestOptions } from '@/app/_lib/reports/log-ingest'
import { LogFormatError } from '@/physics'
import { generateLog, generateLogChunks } from '@/tests/support/log-generator'

const OPTS: IngestOptions = { surface: 'dry-asphalt', map: { rowAxis: [0, 10, 25, 50, 75, 100], colAxis: [0, 10, 20, 40, 60, 80] } }

/** Cuts bytes at the given offsets into a Node Readable of Buffers. */
function streamOf(bytes: Uint8Array, cuts: number[]): Readable {
  const at = [...new Set(cuts.filter((c) => c > 0 && c < bytes.length))].sort((a, b) => a - b)
  const parts: Buffer[] = []
  let prev = 0
  for (const c of [...at, bytes.length]) { parts.push(Buffer.from(bytes.subarray(prev, c))); prev = c }
  return Readable.from(parts)
}

async function rejection(p: Promise<unknown>): Promise<LogFormatError> {
  try { await p } catch (e) { if (e instanceof LogFormatError) return e; throw e }
  throw new Error('expected a LogFormatError')
}

describe('ingestLog (streaming) equals a one-shot parse', () => {
  // CRLF line endings and an ignored column with a multi-byte UTF-8 header, so cuts can fall inside "\r\n" and inside a character.
  const { csv, episodes } = generateLog({ durationS: 240, seed: 7, lineEnding: '\r\n' })
  const text = csv.split('\r\n').map((l, i) => (i === 0 ? `${l},note_°C` : l ? `${l},x` : l)).join('\r\n')
  const bytes = new TextEncoder().encode(text)
  const oneShot = ingestLogText(text, OPTS)

  it('the generated log is what the generator says (sanity of the fixture)', () => {
    expect(oneShot.samples).toBe(12_001)
    expect(oneShot.columns.ignored).toEqual([{ header: 'note_°C', index: 11, reason: 'not a column Mapwright reads' }])
    expect(oneShot.events.filter((e) => e.kind === 'spin').length).toBeGreaterThanOrEqual(1)
    expect(oneShot.events.some((e) => e.kind === 'lock')).toBe(true)
    for (const ev of oneShot.events) expect(episodes.some((g) => g.kind === ev.kind && ev.startS >= g.startS - 0.05 && ev.endS <= g.endS + 0.05)).toBe(true)
  })

  it('for cuts mid-line, mid-number, between \\r and \\n and inside a UTF-8 character', async () => {
    const crlf = text.indexOf('\r\n', 5000)
    const deg = bytes.indexOf(0xb0) // second byte of "°"
    const digit = text.indexOf('.', 20_000) + 1
    const cuts = [1, 7, crlf + 1, deg, digit, 65_536, 65_537, 100_003]
    // A source opened twice reads like the text path: radius calibration first, then the analysis.
    expect(await ingestLog(() => streamOf(bytes, cuts), OPTS)).toEqual(oneShot)
    // A stream can be read once only: no calibration, as the text path without it.
    expect(await ingestLog(streamOf(bytes, cuts), OPTS)).toEqual({ ...ingestLogText(text, { ...OPTS, calibrateRadius: false }), calibration: null })
  })

  it('for one-byte chunks at the start and random cut points (property)', async () => {
    await fc.assert(fc.asyncProperty(fc.array(fc.nat(bytes.length), { maxLength: 40 }), async (cuts) => {
      expect(await ingestLog(() => streamOf(bytes, [...cuts, 1, 2, 3, 4, 5]), OPTS)).toEqual(oneShot)
    }), { numRuns: 15 })
  })

  it('from a web ReadableStream and from an async generator of chunks', async () => {
    const web = () => new ReadableStream<Uint8Array>({ start(c) { c.enqueue(bytes.subarray(0, 333)); c.enqueue(bytes.subarray(333)); c.close() } })
    expect(await ingestLog(web, OPTS)).toEqual(oneShot)
    const gen = { durationS: 240, seed: 7, chunkBytes: 1000 } as const
    expect(await ingestLog(() => generateLogChunks(gen), OPTS)).toEqual(ingestLogText(generateLog(gen).csv, OPTS))
  })

  it('lines with quoted cells (commas, doubled quotes, a quoted number) go through full CSV rules', async () => {
    const quotedText = text.split('\r\n').map((l, i) => (i > 0 && l && i % 97 === 0 ? l.replace(/,x$/, ',"a, ""b"", c"').replace(/^([^,]*),/, '"$1",') : l)).join('\r\n')
    expect(quotedText).toContain('"a, ""b"", c"')
    const bytesQ = new TextEncoder().encode(quotedText)
    expect(await ingestLog(() => streamOf(bytesQ, [4099, 65_536, 200_001]), OPTS)).toEqual(ingestLogText(quotedText, OPTS))
  })

  it('a quoted cell spanning lines is one record; error lines stay physical lines after it', async () => {
    const h = 'time_s,road_speed_kmh,wheel_speed_kmh,accel_pedal_pct,note'
    const log = `${h}\n0,10,10,5,"two\nlines"\n0.1,10,10,5,ok\n0.2,10,10,5,"x"\n`
    const r = await ingestLog(Readable.from([Buffer.from(log)]))
    expect(r.samples).toBe(3)
    expect(r.columns.ignored).toEqual([{ header: 'note', index: 5, reason: 'not a column Mapwright reads' }])
    const e = await rejection(ingestLog(Readable.from([Buffer.from(log + '0.3,bad,10,5,z\n')])))
    expect(e).toMatchObject({ line: 6, column: { index: 2 } })
  })

  it('reports progress with growing bytes and rows', async () => {
    const seen: [number, number][] = []
    const r = await ingestLog(streamOf(bytes, [50_000, 150_000, 300_000]), { ...OPTS, onProgress: (b, n) => seen.push([b, n]) })
    expect(seen.length).toBeGreaterThan(1)
    for (let i = 1; i < seen.length; i++) { expect(seen[i][0]).toBeGreaterThanOrEqual(seen[i - 1][0]); expect(seen[i][1]).toBeGreaterThanOrEqual(seen[i - 1][1]) }
    expect(seen.at(-1)).toEqual([bytes.length, r.samples])
    expect(r.bytes).toBe(bytes.length)
    // Read twice (calibration, then analysis): each pass reports half its bytes, so progress still rises once to the size.
    const twice: number[] = []
    await ingestLog(() => streamOf(bytes, [50_000, 150_000, 300_000]), { ...OPTS, onProgress: (b) => twice.push(b) })
    for (let i = 1; i < twice.length; i++) expect(twice[i]).toBeGreaterThanOrEqual(twice[i - 1])
    expect(twice.at(-1)).toBe(bytes.length)
  })
})

describe('ingestLog refuses bad input with a clear LogFormatError', () => {
  it('binary data, text that is not UTF-8, no delimiter, a header line that never ends', async () => {
    expect((await rejection(ingestLog(Readable.from([Buffer.from([0x50, 0x4b, 3, 4, 0, 0, 1])])))).code).toBe('not-csv')
    expect((await rejection(ingestLog(Readable.from([Buffer.from([0xff, 0xfe, 0x74, 0x00])])))).code).toBe('not-csv')
    expect((await rejection(ingestLog(Readable.from([Buffer.from('hello world\nbye\n')])))).message).toMatch(/no delimiter/)
    expect((await rejection(ingestLog(Readable.from([Buffer.from('a'.repeat(200_000))])))).message).toMatch(/no line break/)
  })
  it('a malformed row deep in the stream, with line and column, and closes the source', async () => {
    const { csv } = generateLog({ durationS: 120, seed: 2 })
    const lines = csv.split('\n')
    lines[4321] = lines[4321].replace(/,[^,]*,/, ',12 km/h,')
    const source = streamOf(new TextEncoder().encode(lines.join('\n')), [70_000, 140_000, 210_000, 280_000])
    const e = await rejection(ingestLog(source, OPTS))
    expect(e).toMatchObject({ code: 'row', line: 4322, column: { index: 2, name: 'road_speed_kmh' } })
    await new Promise((r) => setImmediate(r))
    expect(source.destroyed).toBe(true)
  })
  it('an unbalanced quote does not make the parser buffer the rest of the file', async () => {
    const { csv } = generateLog({ durationS: 600, seed: 3 })
    const broken = csv.replace('\n0.100,', '\n"0.100,')
    const e = await rejection(ingestLog(Readable.from([Buffer.from(broken)]), OPTS))
    expect(e.code).toBe('row')
  })
  it('more than maxBytes', async () => {
    const e = await rejection(ingestLog(generateLogChunks({ durationS: 600, chunkBytes: 4096 }), { maxBytes: 100_000 }))
    expect(e.code).toBe('too-large')
  })
  it('a missing required column names it and lists the headers found', async () => {
    const e = await rejection(ingestLog(Readable.from([Buffer.from('time_s;speed;accel_pedal_pct\n0;1;2\n')])))
    expect(e.message).toBe('line 1: missing required columns road_speed_kmh, a drive-wheel speed (e.g. wheel_speed_kmh); found: "time_s", "speed", "accel_pedal_pct"')
  })
  it('a header mapping lets other names in (semicolon-separated)', async () => {
    const r = await ingestLog(Readable.from([Buffer.from('Zeit;V mph;Rad;Pedal\n0;10;10;5\n0.5;10;11;5\n')]), {
      mapping: { time_s: 'Zeit', road_speed_mph: 'V mph', wheel_speed_mph: 'Rad', accel_pedal_pct: 'Pedal' },
    })
    expect(r.samples).toBe(2)
    expect(r.maxRoadSpeedKmh).toBeCloseTo(16.09344, 12)
    expect(r.slip.max).toBeCloseTo(0.1, 12)
  })
})

describe('a worn tyre in a turn, read from CSV (radius calibration and yaw-rate correction end to end)', () => {
  // 30 s coasting straight at 60 km/h, then 10 s in a left turn of 100 m radius (ψ̇ = 16.667/100 = 0.1667 rad/s
  // = 9.549 °/s) on light torque. Wheels logged with the nominal radius of a tyre whose effective radius is 4 %
  // smaller than nominal (ρ = 1.04); each side wheel is off the axle centre by ψ̇·b/2 = 0.15 m/s = 0.54 km/h (b = 1.8 m).
  const rows = ['time_s,road_speed_kmh,wheel_speed_left_kmh,wheel_speed_right_kmh,accel_pedal_pct,motor_torque_nm,yaw_rate_deg_s']
  for (let i = 0; i <= 400; i++) {
    const t = i / 10
    const turning = t > 30
    const yawDeg = turning ? (60 / 3.6 / 100) * (180 / Math.PI) : 0
    const half = turning ? 0.54 : 0
    rows.push([t.toFixed(1), 60, ((60 - half) * 1.04).toFixed(6), ((60 + half) * 1.04).toFixed(6), turning ? 10 : 0, turning ? 200 : 0, yawDeg.toFixed(6)].join(','))
  }
  const csv = rows.join('\n') + '\n'

  it('calibrates the radius on the straight, corrects the turn by yaw rate, and reads no slip', async () => {
    const r = ingestLogText(csv)
    expect(r.calibration).toMatchObject({ status: 'applied' })
    expect(r.calibration?.ratio).toBeCloseTo(1.04, 9)
    expect(r.turns.yawCorrected).toBe(401)
    expect(r.slip.maxAbs).toBeLessThan(1e-5) // rounding of the CSV cells only
    expect(r.events).toEqual([])
    expect(await ingestLog(() => Readable.from([Buffer.from(csv)]))).toEqual(r)
  })
  it('without the calibration the same log reads 4 % slip everywhere', () => {
    expect(ingestLogText(csv, { calibrateRadius: false }).slip.p50Abs).toBeCloseTo(0.04, 5)
  })
})
