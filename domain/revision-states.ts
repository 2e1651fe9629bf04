/** Where a revision stands in the review workflow: ids as stored in map_revisions.state and revision_events, with labels. */
export const REVISION_STATES = ['draft', 'in_review', 'returned', 'approved', 'released', 'retired', 'withdrawn'] as const
export type RevisionState = (typeof REVISION_STATES)[number]

export const STATE_LABELS: Readonly<Record<RevisionState, string>> = {
  draft: 'Draft',
  in_review: 'Waiting for review',
  returned: 'Sent back',
  approved: 'Approved',
  released: 'Released',
  retired: 'Replaced by a later release',
  withdrawn: 'Release withdrawn',
}

export function isState(s: string): s is RevisionState {
  return REVISION_STATES.some((r) => r === s)
}
