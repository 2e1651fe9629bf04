import type { SetRelease, SetStatus } from '@/db/queries/sets'
import { formatBytes } from '@/app/_components/format'


function Digest({ sha256, bytes }: { sha256: string; bytes: number }) {
  return (
    <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-xs">
      <dt className="text-slate-600">SHA-256</dt>
      <dd className="min-w-0 font-mono break-all" data-testid="package-sha256">{sha256}</dd>
      <dt className="text-slate-600">Size</dt>
      <dd>{formatBytes(bytes)}</dd>
    </dl>
  )
}

/** The test package (always) and the frozen release package (once released), each with its digest. */
export function SetDownloads(props: { setId: number; status: SetStatus; release: SetRelease | null; test: { sha256: string; bytes: number } | { error: string } }) {
  const { setId, status, release } = props
  return (
    <section className="card space-y-4" aria-labelledby="downloads-heading" data-testid="set-downloads">
      <h3 id="downloads-heading" className="font-semibold">Packages</h3>
      {'error' in props.test ? (
        <p className="text-sm" data-testid="test-package-refused">
          <span className="font-semibold">No test package:</span> {props.test.error}
        </p>
      ) : (
        <div>
          <a className="btn" href={`/api/sets/${setId}/package?kind=test`} data-testid="test-package-link">Test package (not for release)</a>
          <p className="mt-1 text-xs text-slate-600">For test drives on a closed course only; every file in it says so. Built from the set as it stands now.</p>
          <Digest {...props.test} />
        </div>
      )}
      {(status === 'released' || status === 'retired') && release && (
        <div>
          {release.packageSha256 && release.packageBytes !== null ? (
            <>
              <a className="btn-primary" href={`/api/sets/${setId}/package?kind=release`} data-testid="release-package-link">Release package</a>
              {status === 'retired' && <p className="mt-1 text-xs font-semibold text-slate-700">Replaced by a later release: kept for the record, not for flashing.</p>}
              <p className="mt-1 text-xs text-slate-600">The bytes frozen at release; the server refuses to serve them if they no longer match this SHA-256.</p>
              <Digest sha256={release.packageSha256} bytes={release.packageBytes} />
            </>
          ) : (
            <p className="text-sm text-slate-600">This set was released before packages were frozen; no release package was kept.</p>
          )}
        </div>
      )}
      {status === 'withdrawn' && <p className="text-sm font-semibold text-danger">The release package of this set was withdrawn and is no longer served.</p>}
    </section>
  )
}
