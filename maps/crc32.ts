/**
 * CRC-32/ISO-HDLC (the CRC of zip, PNG and Ethernet): polynomial 0x04C11DB7 processed
 * reflected (0xEDB88320), init 0xFFFFFFFF, reflected in and out, xorout 0xFFFFFFFF.
 * Check value of ASCII "123456789": 0xCBF43926. Firmware can recompute it with any
 * textbook table-driven or bitwise implementation of those parameters.
 */

const TABLE = (() => {
  const t = new Uint32Array(256)
  for (let n = 0; n < 256; n++) {
    let c = n
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1
    t[n] = c >>> 0
  }
  return t
})()

/**
 * CRC-32 of `bytes` as an unsigned 32-bit integer.
 * @example crc32(new TextEncoder().encode('123456789')) // 0xcbf43926
 */
export function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff
  for (let i = 0; i < bytes.length; i++) c = TABLE[(c ^ bytes[i]) & 0xff] ^ (c >>> 8)
  return (c ^ 0xffffffff) >>> 0
}

/**
 * Little-endian bytes of 32-bit signed integers, the layout the C header's CRC covers.
 * @example int32LeBytes([1, -1]) // Uint8Array [1, 0, 0, 0, 255, 255, 255, 255]
 */
export function int32LeBytes(values: readonly number[]): Uint8Array {
  const bytes = new Uint8Array(values.length * 4)
  const view = new DataView(bytes.buffer)
  values.forEach((v, i) => view.setInt32(i * 4, v, true))
  return bytes
}
