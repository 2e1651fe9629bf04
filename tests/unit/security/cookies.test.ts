import { describe, expect, it } from 'vitest'
import { secureCookies } from '@/app/_lib/auth/auth-options'

describe('session cookie flags', () => {
  it('are Secure outside development, except plain http on loopback', () => {
    expect(secureCookies('https://mapwright.example', 'production')).toBe(true)
    expect(secureCookies('http://mapwright.example', 'production')).toBe(true)
    expect(secureCookies('http://127.0.0.1:3000', 'production')).toBe(false)
    expect(secureCookies('http://localhost:3000', 'production')).toBe(false)
    expect(secureCookies('https://127.0.0.1:3000', 'production')).toBe(true)
    expect(secureCookies('https://mapwright.example', 'development')).toBe(false)
    expect(secureCookies(undefined, 'production')).toBe(true)
  })
})
