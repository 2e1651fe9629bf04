'use client'
import { useEffect, useId, useRef } from 'react'

/**
 * The second step of a weighty action (approve, release, withdraw): one line saying what will
 * happen, then "Yes, …" or "Cancel". Inline rather than a modal so it needs no focus trap: focus
 * moves to the confirm button when it opens, Escape or Cancel closes it, and the caller returns
 * focus to the button that opened it (`onCancel`).
 */
export function ConfirmStep(props: {
  summary: string
  confirmLabel: string
  pending?: boolean
  danger?: boolean
  onConfirm: () => void
  onCancel: () => void
}) {
  const confirmRef = useRef<HTMLButtonElement>(null)
  const id = useId()
  useEffect(() => confirmRef.current?.focus(), [])
  return (
    <div
      role="group"
      aria-labelledby={id}
      className={`space-y-2 rounded border p-3 text-sm ${props.danger ? 'border-danger/50 bg-red-50' : 'border-accent/40 bg-accent-soft'}`}
      data-testid="confirm-step"
      onKeyDown={(e) => {
        if (e.key === 'Escape') {
          e.stopPropagation()
          props.onCancel()
        }
      }}
    >
      <p id={id} className="font-medium">{props.summary}</p>
      <div className="flex flex-wrap gap-2">
        <button
          ref={confirmRef}
          type="button"
          className={props.danger ? 'btn border-danger text-danger' : 'btn-primary'}
          disabled={props.pending}
          onClick={props.onConfirm}
        >
          {props.pending ? 'Working…' : props.confirmLabel}
        </button>
        <button type="button" className="btn" disabled={props.pending} onClick={props.onCancel}>
          Cancel
        </button>
      </div>
    </div>
  )
}
