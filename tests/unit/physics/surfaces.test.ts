import { describe, expect, it } from 'vitest'
import { magicFormula, peakForceRatio, SURFACES, SURFACE_IDS } from '@/physics'

describe('SURFACES', () => {
  it('has the five surfaces with sources, and peak μ equals D (C > 1)', () => {
    expect([...SURFACE_IDS].sort()).toEqual(['dry-asphalt', 'gravel', 'ice', 'packed-snow', 'wet-asphalt'])
    for (const id of SURFACE_IDS) {
      const s = SURFACES[id]
      expect(s.id).toBe(id)
      expect(s.source.length).toBeGreaterThan(40)
      expect(s.passengerCarCoeffs.C).toBeGreaterThan(1)
      expect(s.peakMu).toBe(s.passengerCarCoeffs.D)
      expect(peakForceRatio(s.passengerCarCoeffs)).toBe(s.peakMu)
    }
  })
  it('table values as recalled (Pacejka-based set as widely reproduced; recalled from memory)', () => {
    expect(SURFACES['dry-asphalt'].passengerCarCoeffs).toEqual({ B: 10, C: 1.9, D: 1, E: 0.97 })
    expect(SURFACES['wet-asphalt'].passengerCarCoeffs).toEqual({ B: 12, C: 2.3, D: 0.82, E: 1 })
    expect(SURFACES['packed-snow'].passengerCarCoeffs).toEqual({ B: 5, C: 2, D: 0.3, E: 1 })
    expect(SURFACES.ice.passengerCarCoeffs).toEqual({ B: 4, C: 2, D: 0.1, E: 1 })
    expect(SURFACES.ice.source).toMatch(/recalled from memory/)
  })
  it('gravel fit reproduces Wong’s table: peak 0.6, sliding ≈ 0.55 (Theory of Ground Vehicles ch. 1, recalled from memory)', () => {
    const c = SURFACES.gravel.passengerCarCoeffs
    expect(SURFACES.gravel.peakMu).toBe(0.6)
    expect(magicFormula(1, c)).toBeCloseTo(0.55, 2) // locked-wheel (κ = 1) value ≈ sliding coefficient
    expect(SURFACES.gravel.source).toMatch(/[Ff]itted/)
  })
  it('is frozen', () => {
    expect(Object.isFrozen(SURFACES)).toBe(true)
    expect(Object.isFrozen(SURFACES.ice.passengerCarCoeffs)).toBe(true)
  })
})
