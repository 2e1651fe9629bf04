import Link from 'next/link'
import { SafetyCaution } from '@/app/_components/safety-caution'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { listMaps } from '@/db/queries/maps'
import { ComparePicker } from './compare-picker'
import { loadComparison } from './load-comparison'
import { CompareView } from './compare-view'
import { parseRef } from './revision-ref'

export const metadata = { title: 'Compare revisions' }

type Search = Record<string, string | string[] | undefined>

/** /maps/compare?a=<mapId>:<number>&b=<mapId>:<number>[&loadCase=&surface=&gradePct=&units=] */
export default async function ComparePage(props: { searchParams: Promise<Search> }) {
  const user = await requirePageUser()
  const q = await props.searchParams
  const [a, b] = [parseRef(q.a), parseRef(q.b)]
  const result = a && b ? await loadComparison(a, b, q) : null
  const heading = (
    <div>
      <p className="text-sm text-slate-500"><Link href="/maps" className="hover:underline">Maps</Link> · Compare</p>
      <h1 className="text-2xl font-bold">Compare two revisions</h1>
    </div>
  )
  if (!result || !result.ok) {
    const maps = await listMaps()
    const problem = result ? result.problem : q.a || q.b ? 'Give both revisions as map:number, for example a=1:2&b=1:3.' : undefined
    return (
      <div className="space-y-4">
        {heading}
        <ComparePicker maps={maps} a={typeof q.a === 'string' ? q.a : undefined} b={typeof q.b === 'string' ? q.b : undefined} problem={problem} />
        <SafetyCaution />
      </div>
    )
  }
  return (
    <div className="space-y-4">
      {heading}
      <SafetyCaution />
      {/* Keyed by the pair, so a link to another pair starts with fresh state. */}
      <CompareView key={`${a?.mapId}:${a?.number}-${b?.mapId}:${b?.number}`} {...result.view} canEdit={EDITORS.includes(user.role)} />
    </div>
  )
}
