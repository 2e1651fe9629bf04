'use client'
/**
 * "Propose a traction-safe draft": asks the server for a draft of a revision with every cell above
 * the traction limit lowered to the limit less a margin, shows the changes, and saves the draft as
 * a new revision only when the engineer writes a message and presses save, like any other edit.
 */
import Link from 'next/link'
import { useMutation } from '@tanstack/react-query'
import { useState } from 'react'
import { api } from '@/app/_components/api-client'
import type { ProposalResponse } from '@/app/_lib/physics/propose'
import { ChangeTable } from './change-table'
import type { OverlayChoice } from './overlay-controls'
import { LOAD_CASE_LABELS } from '@/physics/load-cases'
import { SURFACES } from '@/physics/surfaces'
import { tableNumber, type UnitSet } from '@/maps'

export interface ProposalPanelProps {
  mapId: number
  mapName: string
  baseNumber: number
  choice: OverlayChoice
  units: UnitSet
}

/** The margins the proposal accepts, %, the same range the propose route checks. */
const MARGIN_RANGE = [0, 50] as const

export function ProposalPanel({ mapId, mapName, baseNumber, choice, units }: ProposalPanelProps) {
  const [marginText, setMarginText] = useState('10')
  const margin = Number(marginText)
  // Refused, not clamped: a margin typed as 80 must not silently become 50.
  const marginError = marginText.trim() === '' || !Number.isFinite(margin) || margin < MARGIN_RANGE[0] || margin > MARGIN_RANGE[1] ? `The margin must be ${MARGIN_RANGE[0]}–${MARGIN_RANGE[1]} % (got ${marginText.trim() || 'nothing'})` : null
  const [message, setMessage] = useState('')
  const where = `${LOAD_CASE_LABELS[choice.loadCase].toLowerCase()} on ${SURFACES[choice.surface].label.toLowerCase()}${choice.gradePct ? `, ${choice.gradePct} % grade` : ''}`
  const propose = useMutation({
    mutationFn: () => api<ProposalResponse>(`/api/maps/${mapId}/revisions/${baseNumber}/propose`, {
      method: 'POST', json: { loadCase: choice.loadCase, surface: choice.surface, gradePct: choice.gradePct, marginPct: margin },
    }),
  })
  const save = useMutation({
    mutationFn: (p: ProposalResponse) => api<{ revision: { number: number } }>(`/api/maps/${mapId}/revisions`, {
      method: 'POST',
      json: { parentNumber: p.latestNumber, message, notes: `Traction-safe draft from r${p.baseNumber}: cells above the traction limit for ${where}, less ${margin} %, lowered (${p.changes.length} cells).`, table: p.table },
    }),
  })
  const p = propose.data
  const rows = p ? p.changes.map((c) => ({ pedalPct: p.table.rowAxis[c.row], speedKmh: p.table.colAxis[c.col], before: c.before, after: c.after, note: c.reason === 'limit' ? 'above the limit' : 'pedal order' })) : []
  return (
    <section className="card space-y-3" aria-label="Traction-safe draft">
      <div className="flex flex-wrap items-end gap-3">
        <h3 className="font-semibold">Traction-safe draft of {mapName} r{baseNumber}</h3>
        <label className="w-32">
          <span className="label">Margin, {MARGIN_RANGE[0]}–{MARGIN_RANGE[1]} %</span>
          <input className="field" inputMode="decimal" aria-invalid={marginError !== null} aria-describedby={marginError ? 'margin-error' : undefined} value={marginText} onChange={(e) => setMarginText(e.target.value)} />
        </label>
        <button type="button" className="btn" disabled={propose.isPending || marginError !== null} onClick={() => { save.reset(); propose.mutate() }}>
          {propose.isPending ? 'Proposing…' : 'Propose a traction-safe draft'}
        </button>
        <span className="text-xs text-slate-500">for {where}</span>
      </div>
      {marginError && <p id="margin-error" className="error-text" role="alert" data-testid="margin-error">{marginError}</p>}
      {propose.error && <p className="error-text" role="alert">{propose.error.message}</p>}
      {p && (
        <div className="space-y-3">
          <p className="text-sm" data-testid="proposal-summary">
            {p.changes.length === 0
              ? 'Every cell is already under the traction limit less the margin; nothing to change.'
              : `${p.changes.length} cells lowered; ceiling ${tableNumber(units.torqueOut(Math.min(...p.ceilingByCol)), 0)}–${tableNumber(units.torqueOut(Math.max(...p.ceilingByCol)), 0)} ${units.torque}. Not saved yet.`}
          </p>
          {p.baseNumber !== p.latestNumber && (
            <p className="rounded bg-amber-50 px-2 py-1 text-sm text-amber-900">
              The draft starts from r{p.baseNumber}, but r{p.latestNumber} is the latest: saving puts this draft on top of r{p.latestNumber} and replaces its values.
            </p>
          )}
          <ChangeTable rows={rows} units={units} testId="proposal-table" />
          {p.changes.length > 0 && !save.data && <SaveDraft message={message} onMessage={setMessage} pending={save.isPending} onSave={() => save.mutate(p)} />}
          {save.error && <p className="error-text" role="alert">{save.error.message}</p>}
          {save.data && (
            <p role="status" className="rounded bg-accent-soft px-3 py-2 text-sm">
              Saved as r{save.data.revision.number}.{' '}
              <Link className="text-accent underline" href={`/maps/compare?a=${mapId}:${p.baseNumber}&b=${mapId}:${save.data.revision.number}`}>Compare r{p.baseNumber} with r{save.data.revision.number}</Link>
            </p>
          )}
        </div>
      )}
    </section>
  )
}

function SaveDraft({ message, onMessage, pending, onSave }: { message: string; onMessage: (m: string) => void; pending: boolean; onSave: () => void }) {
  const blank = message.trim() === ''
  return (
    <form className="flex flex-wrap items-end gap-2" onSubmit={(e) => { e.preventDefault(); if (!blank) onSave() }}>
      <label className="min-w-72 flex-1">
        <span className="label">Why (required)</span>
        <input className="field" value={message} onChange={(e) => onMessage(e.target.value)} placeholder="e.g. Keep the empty truck within grip on gravel" />
      </label>
      <button type="submit" className="btn-primary" disabled={blank || pending}>{pending ? 'Saving…' : 'Save as new revision'}</button>
    </form>
  )
}
