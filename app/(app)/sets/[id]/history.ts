/**
 * The story of one set, for its page: made, released, replaced by another set's release,
 * brought back when that release was withdrawn, withdrawn. Release rows give the times; the
 * audit trail gives who withdrew and what replaced or brought it back. Pure: the page loads both.
 */

/** An audit row as listAudit returns it (only what the history reads). */
export interface HistoryAuditRow {
  id: number
  at: Date
  actorName: string | null
  action: string
  entityId: number | null
  details: Record<string, unknown>
}

export interface HistoryRelease {
  id: number
  releasedAt: Date
  releasedByName: string
  acknowledgements: readonly unknown[]
  retiredAt: Date | null
  withdrawnAt: Date | null
  withdrawReason: string | null
}

export type HistoryKind = 'created' | 'released' | 'replaced' | 'brought-back' | 'withdrawn'

export interface HistoryEvent {
  at: Date
  kind: HistoryKind
  /** Who did it; null when no record names them. */
  by: string | null
  text: string
  reason?: string
}

/** A retirement and the audit row of the release that caused it are written in one transaction; this allows for its length. */
const SAME_MOMENT_MS = 60_000

const num = (v: unknown): number | null => (typeof v === 'number' ? v : null)

/** Who withdrew this release of the set, from the audit trail; null when no row says. */
export function withdrawnBy(setId: number, releaseId: number, audit: readonly HistoryAuditRow[]): string | null {
  const row = audit.find((a) => a.action === 'set.withdraw' && a.entityId === setId && num(a.details.releaseId) === releaseId)
  return row?.actorName ?? null
}

/**
 * Oldest first. `setNumbers` names other sets (id → number) for "replaced by Set 4".
 * @example setHistory({ setId: 1, createdAt, createdByName: 'A', releases: [], audit: [], setNumbers: new Map() }) // [{ kind: 'created', … }]
 */
export function setHistory(input: {
  setId: number
  createdAt: Date
  createdByName: string | null
  releases: readonly HistoryRelease[]
  audit: readonly HistoryAuditRow[]
  setNumbers: ReadonlyMap<number, number>
}): HistoryEvent[] {
  const { setId, audit } = input
  const other = (id: number | null) => (id !== null && input.setNumbers.has(id) ? `Set ${input.setNumbers.get(id)}` : 'another set')
  const out: HistoryEvent[] = [{ at: input.createdAt, kind: 'created', by: input.createdByName, text: 'Set made' }]
  for (const r of input.releases) {
    const acks = r.acknowledgements.length
    out.push({ at: r.releasedAt, kind: 'released', by: r.releasedByName, text: acks ? `Released, with ${acks} traction exception(s) acknowledged` : 'Released' })
    if (r.withdrawnAt) out.push({ at: r.withdrawnAt, kind: 'withdrawn', by: withdrawnBy(setId, r.id, audit), text: 'Release withdrawn', reason: r.withdrawReason ?? undefined })
  }
  const replaced = audit.filter((a) => a.action === 'set.release' && a.entityId !== setId && num(a.details.replacedSetId) === setId)
  for (const a of replaced) out.push({ at: a.at, kind: 'replaced', by: a.actorName, text: `Replaced by the release of ${other(a.entityId)}` })
  // A retirement with no audit row beside it (data older than the audit of sets) is still shown.
  for (const r of input.releases) {
    if (r.retiredAt && !replaced.some((a) => Math.abs(a.at.getTime() - r.retiredAt!.getTime()) < SAME_MOMENT_MS))
      out.push({ at: r.retiredAt, kind: 'replaced', by: null, text: 'Replaced by a later release' })
  }
  for (const a of audit.filter((x) => x.action === 'set.withdraw' && x.entityId !== setId && num(x.details.restoredSetId) === setId))
    out.push({ at: a.at, kind: 'brought-back', by: a.actorName, text: `Released again: the release of ${other(a.entityId)} that had replaced it was withdrawn`, reason: typeof a.details.reason === 'string' ? a.details.reason : undefined })
  const order: HistoryKind[] = ['created', 'released', 'replaced', 'brought-back', 'withdrawn']
  return out.sort((a, b) => a.at.getTime() - b.at.getTime() || order.indexOf(a.kind) - order.indexOf(b.kind))
}

/** Ids of the other sets the history names (to look their numbers up). */
export function otherSetIds(setId: number, audit: readonly HistoryAuditRow[]): number[] {
  const named = audit.filter((a) => a.entityId !== null && a.entityId !== setId && (num(a.details.replacedSetId) === setId || num(a.details.restoredSetId) === setId))
  return [...new Set(named.map((a) => a.entityId!))]
}
