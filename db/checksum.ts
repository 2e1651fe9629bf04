/**
 * Map checksums, computed on the server with node:crypto. The canonical serialisation stays in
 * maps/ (pure, shared with the browser); only the hashing lives here, where the revision is
 * stored. The browser never computes a checksum: it shows the one the server stored.
 */
import { createHash } from 'node:crypto'
import { canonicalJson } from '../maps/checksum'
import { MapInputError } from '../maps/errors'
import type { MapTable } from '../physics/table'

/**
 * SHA-256 digest of bytes, or of a string encoded as UTF-8, as 64 lowercase hex digits.
 * @example sha256Hex('abc') // 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'
 */
export function sha256Hex(input: Uint8Array | string): string {
  // node:crypto encodes a string as UTF-8 by default.
  return createHash('sha256').update(input).digest('hex')
}

/**
 * SHA-256 (hex) of the UTF-8 bytes of canonicalJson(table) — the checksum stored with every revision.
 * @example checksum(t) === sha256Hex(canonicalJson(t)) // true
 */
export function checksum(table: MapTable): string {
  return sha256Hex(canonicalJson(table))
}

/**
 * The content checksum of a table, after checking that a stored one (any letter case) matches
 * it: an export must never label a table with another table's checksum.
 * @example verifiedChecksum(rev.table, rev.checksum) // rev.checksum in lower case, or throws 'checksum-mismatch'
 */
export function verifiedChecksum(table: MapTable, stored: string): string {
  const sum = checksum(table)
  if (stored.toLowerCase() !== sum)
    throw new MapInputError('checksum-mismatch', `the given checksum ${stored.slice(0, 80)} does not match the table content (${sum})`)
  return sum
}
