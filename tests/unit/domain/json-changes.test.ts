import { describe, expect, it } from 'vitest'
import { jsonChanges } from '@/domain/json-changes'

describe('jsonChanges', () => {
  it('lists each changed leaf by path, with added and removed keys', () => {
    expect(jsonChanges({ a: 1, b: { c: [1, 2], d: 'x' }, gone: true }, { a: 1, b: { c: [1, 3], d: 'y' }, added: null })).toEqual([
      { path: 'added', from: null, to: null },
      { path: 'b.c[1]', from: 2, to: 3 },
      { path: 'b.d', from: 'x', to: 'y' },
      { path: 'gone', from: true, to: null },
    ])
  })

  it('treats an array whose length changed as one change, and equal values as none', () => {
    expect(jsonChanges({ g: [1, 2] }, { g: [1, 2, 3] })).toEqual([{ path: 'g', from: [1, 2], to: [1, 2, 3] }])
    expect(jsonChanges({ t: { m: 1 } }, { t: { m: 1 } })).toEqual([])
    expect(jsonChanges({ t: null }, { t: { m: 1 } })).toEqual([{ path: 't', from: null, to: { m: 1 } }])
  })
})
