/** What a reviewer can do to a revision: ids as stored in revision_events.action, with the button words. */
export const REVIEW_ACTIONS = ['submit', 'approve', 'send_back', 'release', 'withdraw'] as const
export type ReviewAction = (typeof REVIEW_ACTIONS)[number]

export const ACTION_LABELS: Readonly<Record<ReviewAction, string>> = {
  submit: 'Submit for review',
  approve: 'Approve',
  send_back: 'Send back',
  release: 'Release to the vehicles',
  withdraw: 'Withdraw release',
}
