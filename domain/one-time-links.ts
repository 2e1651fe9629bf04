/** Kinds of one-time link sent by e-mail (auth_tokens.kind). */
export const LINK_KINDS = ['invite', 'reset'] as const
export type LinkKind = (typeof LINK_KINDS)[number]
