import { describe, expect, it } from 'vitest'
import { resolveClientAddress } from '@/app/_lib/http/client-address'

describe('client address', () => {
  it('with no trusted proxy configured, is the socket peer whatever X-Forwarded-For says', () => {
    expect(resolveClientAddress('203.0.113.7', '=cmd|calc!A0, 10.0.0.1', [])).toBe('203.0.113.7')
    expect(resolveClientAddress('::ffff:203.0.113.7', null, [])).toBe('203.0.113.7')
    expect(resolveClientAddress(null, '198.51.100.1', [])).toBeNull()
  })

  it('behind a trusted proxy, is the rightmost hop that is not a trusted proxy', () => {
    // The client prepended a fake hop; the proxy appended the address it really saw.
    expect(resolveClientAddress('127.0.0.1', '1.2.3.4, 198.51.100.9', ['127.0.0.1'])).toBe('198.51.100.9')
    expect(resolveClientAddress('10.0.0.2', '198.51.100.9, 10.0.0.3', ['10.0.0.2', '10.0.0.3'])).toBe('198.51.100.9')
    expect(resolveClientAddress('::1', '2001:db8::5', ['::1'])).toBe('2001:db8::5')
  })

  it('a peer that is not a trusted proxy cannot speak for anyone else', () => {
    expect(resolveClientAddress('198.51.100.20', '127.0.0.1', ['127.0.0.1'])).toBe('198.51.100.20')
  })
})
