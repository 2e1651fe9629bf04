/** The message for text over its limit, stating the limit: "Name must be at most 120 characters". */
export const atMost = (label: string, max: number) => `${label} must be at most ${max.toLocaleString('en-US')} characters`

/** RFC 5321 §4.5.3.1.3: a forward path is at most 256 octets including the angle brackets, so 254 for the address. */
export const EMAIL_MAX = 254
