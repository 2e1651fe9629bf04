'use client'
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query'
import { useState } from 'react'
import { api } from '@/app/_components/api-client'
import { isLogPending, type LogStatus } from '@/domain/log-statuses'
import { uploadLog } from './upload-log'
import { LogAnalysisView } from './log-analysis'
import { LogColumnHelp } from './log-column-help'
import { LogColumnMapping } from './log-column-mapping'
import { formatBytes } from '@/app/_components/format'
import { readFileHeader, readStoredHeader } from '@/app/_lib/reports/column-mapping/header-names'
import { guessChoices, mappingProblems, type Choices } from '@/app/_lib/reports/column-mapping/column-choices'

export interface LogItem {
  id: number
  fileName: string
  sizeBytes: number
  status: LogStatus
  progressBytes: number
  errorMessage: string | null
  /** The column mapping it was read with: `{ ourColumn: theirHeader }`. */
  mapping: Record<string, string>
  createdAt: string
}

/** A file (to upload) or a stored log (to read again) waiting for its columns to be picked. */
type Mapping = { fileName: string; headers: string[]; initial: Choices } & ({ file: File } | { logId: number })

/**
 * The report's drive logs. The filing driver attaches and removes logs until a lead engineer has
 * read the report; the driver or a lead can run an analysis again. Each is in the audit trail.
 */
export function LogsPanel(props: { reportId: number; setId: number; initialLogs: LogItem[]; isDriver: boolean; isLead: boolean; read: boolean; needsBrake: boolean }) {
  const qc = useQueryClient()
  const canUpload = props.isDriver && !props.read
  const [upload, setUpload] = useState<{ name: string; fraction: number } | null>(null)
  const [error, setError] = useState<string | null>(null)
  const [mapping, setMapping] = useState<Mapping | null>(null)
  const logs = useQuery({
    queryKey: ['logs', props.reportId],
    initialData: { logs: props.initialLogs },
    queryFn: () => api<{ logs: LogItem[] }>(`/api/reports/${props.reportId}/logs`),
    // Poll while a log is still being parsed, so the progress bar moves.
    refetchInterval: (q) => (q.state.data?.logs.some((l) => isLogPending(l.status)) ? 1000 : false),
  })

  const refresh = () => qc.invalidateQueries({ queryKey: ['logs', props.reportId] })
  const again = useMutation({
    mutationFn: (logId: number) => api(`/api/reports/${props.reportId}/logs/${logId}`, { method: 'POST' }),
    onSuccess: (_d, logId) => Promise.all([refresh(), qc.invalidateQueries({ queryKey: ['log', logId] })]),
  })
  const remap = useMutation({
    mutationFn: (v: { logId: number; mapping: Record<string, string> }) => api(`/api/reports/${props.reportId}/logs/${v.logId}`, { method: 'PATCH', json: { mapping: v.mapping } }),
    onSuccess: (_d, v) => {
      setMapping(null)
      return Promise.all([refresh(), qc.invalidateQueries({ queryKey: ['log', v.logId] })])
    },
  })
  const remove = useMutation({
    mutationFn: (logId: number) => api(`/api/reports/${props.reportId}/logs/${logId}`, { method: 'DELETE' }),
    onSuccess: refresh,
  })

  // The file's header is read here first: a log in our own column names goes up at once; any other asks which column is which.
  async function onPick(file: File) {
    setError(null)
    setMapping(null)
    try {
      const headers = await readFileHeader(file)
      const initial = guessChoices(headers)
      if (mappingProblems(initial, props.needsBrake).length === 0) await send(file, {})
      else setMapping({ file, fileName: file.name, headers, initial })
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e))
    }
  }

  async function mapAgain(l: LogItem) {
    setError(null)
    try {
      const headers = await readStoredHeader(`/api/reports/${props.reportId}/logs/${l.id}/file`)
      setMapping({ logId: l.id, fileName: l.fileName, headers, initial: guessChoices(headers, l.mapping) })
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e))
    }
  }

  async function send(file: File, columns: Record<string, string>) {
    setMapping(null)
    setUpload({ name: file.name, fraction: 0 })
    const q = new URLSearchParams({ name: file.name })
    if (Object.keys(columns).length > 0) q.set('mapping', JSON.stringify(columns))
    try {
      await uploadLog(`/api/reports/${props.reportId}/logs?${q}`, file, (fraction) => setUpload({ name: file.name, fraction }))
      await qc.invalidateQueries({ queryKey: ['logs', props.reportId] })
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e))
    } finally {
      setUpload(null)
    }
  }

  return (
    <section className="card space-y-3">
      <h2 className="font-semibold">Data logs</h2>
      {props.isDriver && props.read && <p className="text-sm text-slate-600">A lead engineer has read this report, so logs can no longer be added or removed. File a new report for a new drive.</p>}
      {canUpload && (
        <div className="space-y-2">
          <label htmlFor="log-file" className="label">Attach the vehicle’s data log (CSV, up to 200 MB)</label>
          <input id="log-file" type="file" accept=".csv,text/csv" className="block w-full max-w-full text-sm" disabled={Boolean(upload)} onChange={(e) => e.target.files?.[0] && onPick(e.target.files[0])} />
          <p className="text-xs text-slate-600">A log whose columns carry other names asks which is which before it is sent.</p>
          {mapping && 'file' in mapping && (
            <LogColumnMapping
              key={`file:${mapping.fileName}`}
              fileName={mapping.fileName}
              headers={mapping.headers}
              initial={mapping.initial}
              needsBrake={props.needsBrake}
              submitLabel="Upload with these columns"
              busy={Boolean(upload)}
              onSubmit={(m) => void send(mapping.file, m)}
              onCancel={() => setMapping(null)}
            />
          )}
          <LogColumnHelp />
          {upload && <Progress label={`Uploading ${upload.name}`} fraction={upload.fraction} />}
          {error && <p role="alert" className="error-text text-sm">{error}</p>}
        </div>
      )}
      {logs.data.logs.length === 0 && <p className="text-sm text-slate-500">No log attached.</p>}
      {logs.data.logs.map((l) => (
        <div key={l.id} className="space-y-2 border-t border-line pt-2" data-testid={`log-${l.id}`}>
          <p className="text-sm break-words">
            <a className="text-accent hover:underline" href={`/api/reports/${props.reportId}/logs/${l.id}/file`}>{l.fileName}</a> · {formatBytes(l.sizeBytes)} · <span data-testid="log-status">{l.status}</span>
          </p>
          {isLogPending(l.status) && <Progress label="Reading the log" fraction={l.sizeBytes ? l.progressBytes / l.sizeBytes : 0} />}
          {l.status === 'failed' && <p role="alert" className="error-text text-sm">{l.errorMessage}</p>}
          {!isLogPending(l.status) && (props.isDriver || props.isLead) && (
            <p className="flex flex-wrap gap-2">
              <button type="button" className="btn" disabled={again.isPending} onClick={() => again.mutate(l.id)}>Analyse again</button>
              {canUpload && l.status === 'failed' && (
                <button type="button" className="btn" onClick={() => void mapAgain(l)}>Map the columns again</button>
              )}
              {canUpload && (
                <button type="button" className="btn text-danger" disabled={remove.isPending} onClick={() => window.confirm(`Remove ${l.fileName} from this report?`) && remove.mutate(l.id)}>
                  Remove this log
                </button>
              )}
            </p>
          )}
          {again.error && again.variables === l.id && <p role="alert" className="error-text text-sm">{again.error.message}</p>}
          {remove.error && remove.variables === l.id && <p role="alert" className="error-text text-sm">{remove.error.message}</p>}
          {mapping && 'logId' in mapping && mapping.logId === l.id && (
            <LogColumnMapping
              key={`log:${l.id}`}
              fileName={l.fileName}
              headers={mapping.headers}
              initial={mapping.initial}
              needsBrake={props.needsBrake}
              submitLabel="Analyse again with these columns"
              busy={remap.isPending}
              onSubmit={(m) => remap.mutate({ logId: l.id, mapping: m })}
              onCancel={() => setMapping(null)}
            />
          )}
          {remap.error && remap.variables?.logId === l.id && <p role="alert" className="error-text text-sm">{remap.error.message}</p>}
          {l.status === 'done' && <LogAnalysisView reportId={props.reportId} logId={l.id} setId={props.setId} />}
        </div>
      ))}
    </section>
  )
}

function Progress({ label, fraction }: { label: string; fraction: number }) {
  const pct = Math.round(Math.min(1, Math.max(0, fraction)) * 100)
  return (
    <div>
      <p className="text-xs text-slate-600">{label}: {pct} %</p>
      <div role="progressbar" aria-label={label} aria-valuenow={pct} aria-valuemin={0} aria-valuemax={100} className="h-2 rounded bg-slate-200">
        <div className="h-2 rounded bg-accent" style={{ width: `${pct}%` }} />
      </div>
    </div>
  )
}
