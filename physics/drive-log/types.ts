/** Plain data types shared by the drive-log decoder, analyser and ingest. */
import type { MapKind } from '../table'
import type { DriveTyreParams } from '../drive-tyre'
import type { Surface, SurfaceId } from '../surfaces'
import type { LogColumnRef } from './errors'
import type { WheelChannel } from './columns'

/**
 * One logged instant in working units. NaN (or undefined for the optional fields) marks a missing
 * value. The analyser reads a sample during `push` and never keeps or changes it.
 */
export interface LogSample {
  /** Time, s; must not decrease. */
  timeS: number
  /** Vehicle speed over ground V, km/h. */
  roadSpeedKmh: number
  /** Drive-wheel tread surface speeds Ω·R, km/h: one value or one per wheel; NaN entries are missing. */
  wheelSpeedsKmh: readonly number[]
  /** Accelerator pedal, %. */
  accelPedalPct: number
  brakePedalPct?: number
  motorTorqueNm?: number
  motorSpeedRpm?: number
  /** Pack current, A, positive when discharging. */
  batteryCurrentA?: number
  batteryVoltageV?: number
  /** Yaw rate ψ̇, rad/s, positive turning left (ISO 8855: z axis up). */
  yawRateRadS?: number
  /** 1-based line in the file (for error messages); defaults to sample count + 1. */
  line?: number
}

/** Slip thresholds for event detection (dimensionless slip ratio, seconds). */
export interface SlipThresholds {
  /** Wheel spin when κ > spinSlip. Default: the surface's peak slip, or 0.15 without a surface. */
  spinSlip?: number
  /** Lock-up when κ < −lockSlip. Default: the spin threshold. */
  lockSlip?: number
  /** Shorter excursions are not reported as events, s. Default 0.1. */
  minDurationS?: number
  /** An event ends when |κ| falls below this fraction of its entry threshold (hysteresis). Default 0.75. */
  exitFraction?: number
  /** An event also needs |wheel − road| above this to start, km/h. Default 2. */
  minSpeedDiffKmh?: number
  /** …and ends when |wheel − road| falls below this, km/h. Default 1. */
  exitSpeedDiffKmh?: number
  /** Slip is judged (events and statistics) only when road or wheel speed is at least this, km/h. Default 5. */
  minSpeedKmh?: number
}

/** Outcome of the per-log effective-radius calibration (see `radius-calibration.ts`). */
export interface RadiusCalibration {
  /** 'applied': wheel speeds divided by `ratio`; 'rejected': beyond the bound, not applied; 'insufficient': too little data. */
  status: 'applied' | 'rejected' | 'insufficient'
  /** Wheel-to-road speed ratio ρ = R_nom/R_eff on straight, steady zero-torque stretches; null when there were none. */
  ratio: number | null
  /** R_eff/R_nom − 1 = 1/ρ − 1, %; null when there were no stretches. */
  radiusChangePct: number | null
  /** Qualifying time, s, and samples. */
  seconds: number
  samples: number
  /** Largest |radiusChangePct| applied, %. */
  boundPct: number
  /** One sentence for the report page. */
  reason: string
}

/** Options of {@link createLogAnalyser}. Nothing here is mutated. */
export interface LogAnalyserOptions {
  /** Map axes for the occupancy grid: rows pedal %, columns road speed km/h (ascending). */
  map?: { rowAxis: readonly number[]; colAxis: readonly number[] }
  /** 'drive' indexes rows by accelerator pedal; 'regen' by brake pedal, counting only accelerator-released time. */
  kind?: MapKind
  /** Surface whose peak slip (with the drive tyre below) is the default spin/lock threshold. */
  surface?: Surface | SurfaceId
  /** The program's drive tyre; absent = the default truck tyre. */
  driveTyre?: DriveTyreParams | null
  thresholds?: SlipThresholds
  /** A time step longer than this is a gap (nothing integrated across it), s. Default 1. */
  maxGapS?: number
  /** Accelerator at or below this counts as released for regen occupancy, %. Default 1. */
  pedalReleasedPct?: number
  /** Bounded reservoir for slip percentiles (exact while the moving-sample count ≤ size). Default 16 384. */
  reservoirSize?: number
  /** Upper bound on plotted points per channel (min and max per bucket). Default 2000. */
  maxSeriesPoints?: number
  /** Events kept; later ones are counted, not stored. Default 10 000. */
  maxEvents?: number
  /** The time column, for the position in a time-order error. */
  timeColumn?: LogColumnRef
  /** Channel of each `wheelSpeedsKmh` entry (from the layout); unnamed entries are judged as independent wheels. */
  wheelChannels?: readonly WheelChannel[]
  /** Drive-axle track width for the yaw-rate correction, m. Default 1.8. */
  trackWidthM?: number
  /** A calibration from a first pass over the same log; applied when its status is 'applied'. */
  radiusCalibration?: RadiusCalibration
}

/** Conditions at one instant of an event. */
export interface EventPoint { timeS: number; slip: number; roadSpeedKmh: number; accelPedalPct: number; brakePedalPct: number | null }

/** A wheel-spin (κ above +threshold) or lock-up (κ below −threshold) episode. */
export interface SlipEvent {
  kind: 'spin' | 'lock'
  startS: number
  /** First in-band sample after the event, or the last flagged sample before a gap / the end, s. */
  endS: number
  durationS: number
  /** Signed slip of largest magnitude during the event. */
  peakSlip: number
  start: EventPoint
  peak: EventPoint
  startLine: number
}

/** Seconds spent at each map breakpoint (bilinear share), plus time not attributable to any cell. */
export interface MapOccupancy {
  kind: MapKind
  rowAxis: number[]
  colAxis: number[]
  /** seconds[row][col], s. */
  seconds: number[][]
  /** Covered time with no usable pedal/speed (incomplete sample, or accelerator pressed in regen), s. */
  unassignedS: number
}

/** Per-bucket minimum and maximum of one channel; null where the bucket holds no value. */
export interface SeriesChannel { min: (number | null)[]; max: (number | null)[] }

/** Min/max-bucketed time series for plotting; spikes survive as bucket extremes. */
export interface DownsampledSeries {
  bucketS: number
  /** Bucket start times, s. */
  tS: number[]
  roadSpeedKmh: SeriesChannel
  wheelSpeedKmh: SeriesChannel
  accelPedalPct: SeriesChannel
  brakePedalPct: SeriesChannel
  motorTorqueNm: SeriesChannel
  slip: SeriesChannel
}

/** Everything {@link createLogAnalyser} reports. Times s, speeds km/h, energy kWh. */
export interface AnalysisResult {
  samples: number
  /** Samples missing road speed, all wheel speeds or the pedal; they carry no slip. */
  incompleteSamples: number
  startS: number
  endS: number
  durationS: number
  gaps: { count: number; totalS: number }
  /** durationS − gaps.totalS. */
  coveredS: number
  duplicateTimestamps: number
  distanceKm: number
  maxRoadSpeedKmh: number
  /** From V·I by the trapezoid rule; null when the log has no voltage or current. */
  energy: { drawnKWh: number; regeneratedKWh: number; netKWh: number } | null
  slip: {
    /** Samples with road or wheel speed ≥ thresholds.minSpeedKmh (5 km/h); the statistics use these. */
    movingSamples: number
    min: number | null
    max: number | null
    meanAbs: number | null
    maxAbs: number | null
    p50Abs: number | null
    p95Abs: number | null
    p99Abs: number | null
    quantiles: 'exact' | 'reservoir'
  }
  thresholds: {
    spinSlip: number
    lockSlip: number
    exitFraction: number
    minSpeedDiffKmh: number
    exitSpeedDiffKmh: number
    minDurationS: number
    minSpeedKmh: number
    source: 'option' | 'surface' | 'default'
  }
  /** How the wheel speeds were judged: samples corrected by yaw rate, by the left/right mean, or neither. */
  turns: { yawCorrected: number; leftRightMean: number; uncorrected: number; trackWidthM: number }
  /** The radius calibration applied (or refused) on this log; null when none was run. */
  calibration: RadiusCalibration | null
  events: SlipEvent[]
  /** Events beyond maxEvents, counted only. */
  eventsDropped: number
  /** Excursions beyond a threshold shorter than minDurationS. */
  shortExcursions: number
  occupancy: MapOccupancy | null
  series: DownsampledSeries
}
