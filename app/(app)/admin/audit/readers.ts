/** Who may read the audit trail (the layout and the page both check it). */
export const AUDIT_READERS = ['admin', 'lead_engineer'] as const
