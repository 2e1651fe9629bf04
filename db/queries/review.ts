import { and, asc, desc, eq, sql } from 'drizzle-orm'
import type { ReviewAction } from '../../domain/review-actions'
import type { RevisionState } from '../../domain/revision-states'
import { getDb, type Db } from '../client'
import { mapRevisions, maps, reviewComments, revisionEvents, users, vehiclePrograms } from '../schema'
import { recordAudit } from './audit'
import { enqueueMail, type OutgoingMail } from './mail'

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0]

export type TransitionResult = { ok: true } | { ok: false; currentState: RevisionState | 'missing' }

/**
 * Move a revision from one state to another if (and only if) it is still in `from`: two leads
 * approving at once both run this, one wins and the other is told the state changed. The event,
 * the audit row and the mail are written in the same transaction.
 */
export async function transitionRevision(input: {
  revisionId: number
  actorId: number
  action: ReviewAction
  from: RevisionState
  to: RevisionState
  comment: string
  mail?: OutgoingMail[]
  extra?: (tx: Tx) => Promise<void>
}): Promise<TransitionResult> {
  const db = await getDb()
  return db.transaction(async (tx) => {
    const moved = await tx
      .update(mapRevisions)
      .set({ state: input.to })
      .where(and(eq(mapRevisions.id, input.revisionId), eq(mapRevisions.state, input.from)))
      .returning({ id: mapRevisions.id, mapId: mapRevisions.mapId, number: mapRevisions.number })
    if (!moved[0]) {
      const [cur] = await tx.select({ state: mapRevisions.state }).from(mapRevisions).where(eq(mapRevisions.id, input.revisionId))
      return { ok: false, currentState: cur?.state ?? 'missing' } as const
    }
    await tx.insert(revisionEvents).values({ revisionId: input.revisionId, actorId: input.actorId, action: input.action, fromState: input.from, toState: input.to, comment: input.comment })
    if (input.extra) await input.extra(tx)
    await recordAudit({ actorId: input.actorId, action: `revision.${input.action}`, entityType: 'map', entityId: moved[0].mapId, details: { revision: moved[0].number, from: input.from, to: input.to, comment: input.comment } }, tx)
    await enqueueMail(input.mail ?? [], tx)
    return { ok: true } as const
  })
}

export async function listRevisionEvents(filter: { revisionId?: number; mapId?: number }) {
  const db = await getDb()
  return db
    .select({ id: revisionEvents.id, revisionId: revisionEvents.revisionId, number: mapRevisions.number, action: revisionEvents.action, fromState: revisionEvents.fromState, toState: revisionEvents.toState, comment: revisionEvents.comment, at: revisionEvents.at, actorName: users.name })
    .from(revisionEvents)
    .innerJoin(mapRevisions, eq(mapRevisions.id, revisionEvents.revisionId))
    .innerJoin(users, eq(users.id, revisionEvents.actorId))
    .where(filter.revisionId ? eq(revisionEvents.revisionId, filter.revisionId) : eq(mapRevisions.mapId, filter.mapId ?? -1))
    .orderBy(desc(revisionEvents.at), desc(revisionEvents.id))
}

export type RevisionEventRow = Awaited<ReturnType<typeof listRevisionEvents>>[number]

export async function addReviewComment(c: { revisionId: number; authorId: number; row: number | null; col: number | null; body: string }, conn?: Db) {
  const db = conn ?? (await getDb())
  const [row] = await db.insert(reviewComments).values(c).returning()
  return row
}

/** One comment as addReviewComment returned it (a repeated request answers with the first). */
export async function getReviewComment(id: number) {
  const db = await getDb()
  const [row] = await db.select().from(reviewComments).where(eq(reviewComments.id, id))
  return row ?? null
}

export async function listReviewComments(filter: { revisionId?: number; mapId?: number }) {
  const db = await getDb()
  return db
    .select({ id: reviewComments.id, revisionId: reviewComments.revisionId, number: mapRevisions.number, row: reviewComments.row, col: reviewComments.col, body: reviewComments.body, createdAt: reviewComments.createdAt, authorName: users.name })
    .from(reviewComments)
    .innerJoin(mapRevisions, eq(mapRevisions.id, reviewComments.revisionId))
    .innerJoin(users, eq(users.id, reviewComments.authorId))
    .where(filter.revisionId ? eq(reviewComments.revisionId, filter.revisionId) : eq(mapRevisions.mapId, filter.mapId ?? -1))
    .orderBy(asc(reviewComments.createdAt))
}

export type ReviewCommentRow = Awaited<ReturnType<typeof listReviewComments>>[number]

/** Revisions in a state, across maps, oldest first (the lead's queue; an engineer's sent-back list). */
export async function revisionsInState(state: RevisionState, filter: { authorId?: number } = {}) {
  const db = await getDb()
  return db
    .select({ id: mapRevisions.id, mapId: maps.id, mapName: maps.name, programName: vehiclePrograms.name, number: mapRevisions.number, message: mapRevisions.message, authorId: mapRevisions.authorId, authorName: users.name, createdAt: mapRevisions.createdAt })
    .from(mapRevisions)
    .innerJoin(maps, eq(maps.id, mapRevisions.mapId))
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, maps.programId))
    .innerJoin(users, eq(users.id, mapRevisions.authorId))
    .where(filter.authorId ? and(eq(mapRevisions.state, state), eq(mapRevisions.authorId, filter.authorId)) : eq(mapRevisions.state, state))
    .orderBy(asc(mapRevisions.createdAt))
}

/**
 * Maps whose latest revision is a draft by this author, newest first: what they could still submit
 * (the review queue's "your drafts"). An older draft under a newer revision is history, not work.
 */
export async function latestDraftsBy(authorId: number) {
  const db = await getDb()
  return db
    .select({ id: mapRevisions.id, mapId: maps.id, mapName: maps.name, programName: vehiclePrograms.name, number: mapRevisions.number, message: mapRevisions.message, authorId: mapRevisions.authorId, createdAt: mapRevisions.createdAt })
    .from(mapRevisions)
    .innerJoin(maps, eq(maps.id, mapRevisions.mapId))
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, maps.programId))
    .where(and(eq(mapRevisions.authorId, authorId), eq(mapRevisions.state, 'draft'), sql`${mapRevisions.number} = (select max(r.number) from map_revisions r where r.map_id = ${maps.id})`))
    .orderBy(desc(mapRevisions.createdAt))
}

/** An author's sent-back revisions, oldest first, each with the newest send-back comment and the lead who wrote it. */
export async function sentBackTo(authorId: number) {
  const db = await getDb()
  const lastSendBack = sql`(select e.id from revision_events e where e.revision_id = ${mapRevisions.id} and e.action = 'send_back' order by e.at desc, e.id desc limit 1)`
  return db
    .select({ id: mapRevisions.id, mapId: maps.id, mapName: maps.name, programName: vehiclePrograms.name, number: mapRevisions.number, message: mapRevisions.message, comment: revisionEvents.comment, sentBackBy: users.name, sentBackAt: revisionEvents.at })
    .from(mapRevisions)
    .innerJoin(maps, eq(maps.id, mapRevisions.mapId))
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, maps.programId))
    .leftJoin(revisionEvents, eq(revisionEvents.id, lastSendBack))
    .leftJoin(users, eq(users.id, revisionEvents.actorId))
    .where(and(eq(mapRevisions.authorId, authorId), eq(mapRevisions.state, 'returned')))
    .orderBy(asc(mapRevisions.createdAt))
}
