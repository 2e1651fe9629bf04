import 'server-only'
import { notFound } from 'next/navigation'
import { MalformedIdError } from './errors'
import { intParam } from './request'

/**
 * Page params read with the API's own rule (`intParam`: plain digits, 1 … 2^31-1). Where the
 * API answers 404, a page answers with its 404 page: `/maps/abc` and `/maps/99999999999` name
 * nothing, and must never reach the database as a number it cannot hold (a 500).
 */
export function pageId(value: string | undefined, name: string): number {
  const id = idOrNull(value, name)
  if (id === null) notFound()
  return id
}

/** The same rule for an optional id (a search param, part of a compound value): null when absent or malformed. */
export function idOrNull(value: string | string[] | undefined, name = 'id'): number | null {
  if (typeof value !== 'string') return null
  try {
    return intParam(value, name)
  } catch (e) {
    if (e instanceof MalformedIdError) return null
    throw e
  }
}
