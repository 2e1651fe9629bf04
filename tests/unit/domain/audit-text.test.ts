// The audit trail's plain words: each stored action has a label, and details read as one sentence.
import { describe, expect, it } from 'vitest'
import { auditActionLabel, auditSentence } from '@/domain/audit-text'

describe('audit text', () => {
  it('labels known actions and shows an unknown action id as it is', () => {
    expect(auditActionLabel('set.withdraw')).toBe('Release withdrawn')
    expect(auditActionLabel('revision.send_back')).toBe('Sent back')
    expect(auditActionLabel('something.new')).toBe('something.new')
  })

  it('turns details into one sentence with role and state labels, not ids', () => {
    expect(auditSentence('user.update', { role: 'lead_engineer', passwordChanged: false })).toBe('Role set to lead engineer.')
    expect(auditSentence('user.update', { disabled: true, passwordChanged: true })).toBe('Disabled; password changed.')
    expect(auditSentence('revision.approve', { revision: 4, from: 'in_review', to: 'approved', comment: '' })).toBe('r4 (Waiting for review → Approved).')
    expect(auditSentence('set.withdraw', { reason: 'Judder on  wet\nramps', restoredSetId: 3 })).toBe('Reason: “Judder on wet ramps” — the release before it is back in the trucks.')
    expect(auditSentence('set.release', { acknowledgements: [{}, {}], replacedSetId: null })).toBe('With 2 traction exceptions acknowledged.')
    expect(auditSentence('user.invite', { email: 'a@b.example', role: 'test_driver' })).toBe('a@b.example as test driver.')
    expect(auditActionLabel('report.log-remap')).toBe('Log columns mapped again')
    expect(auditSentence('report.log-remap', { fileName: 'run.csv', from: {}, to: { time_s: 't', road_speed_kmh: 'VehSpd' } })).toBe('“run.csv” — 2 columns mapped.')
    expect(auditSentence('report.log-remap', { fileName: 'run.csv', from: { time_s: 't' }, to: {} })).toBe('“run.csv” — no column mapped (the file’s own names).')
  })

  it('gives sizes below 1 MB in kB and cuts long quotes to one line', () => {
    expect(auditSentence('report.log-upload', { fileName: 'run.csv', sizeBytes: 420_000 })).toBe('“run.csv” (420 kB).')
    expect(auditSentence('report.log-upload', { fileName: 'big.csv', sizeBytes: 2_500_000 })).toBe('“big.csv” (2.5 MB).')
    const long = auditSentence('report.safety-resolved', { comment: 'x'.repeat(300) })
    expect(long.length).toBeLessThan(130)
    expect(long.endsWith('…”')).toBe(true)
  })

  it('says nothing for details it cannot read, rather than guessing', () => {
    expect(auditSentence('something.new', { a: 1 })).toBe('')
    expect(auditSentence('user.update', { role: 'pilot' })).toBe('')
    expect(auditSentence('revision.save', {})).toBe('')
  })
})
