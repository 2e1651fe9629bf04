'use client'
/** The physics overlay of one revision for a choice of load case, surface and grade, from the overlay route. */
import { keepPreviousData, useQuery } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import type { MapOverlay } from '@/physics/overlay'
import type { OverlayChoice } from './overlay-controls'

type Physics = Pick<OverlayChoice, 'loadCase' | 'surface' | 'gradePct'>

const same = (x: Physics, y: Physics) => x.loadCase === y.loadCase && x.surface === y.surface && x.gradePct === y.gradePct

export function useOverlay(mapId: number, number: number, choice: Physics, initial?: { choice: Physics; overlay: MapOverlay }) {
  const { loadCase, surface, gradePct } = choice
  return useQuery({
    queryKey: ['overlay', mapId, number, loadCase, surface, gradePct],
    queryFn: () => api<MapOverlay>(`/api/maps/${mapId}/revisions/${number}/overlay?${new URLSearchParams({ loadCase, surface, gradePct: String(gradePct) })}`),
    initialData: initial && same(initial.choice, choice) ? initial.overlay : undefined,
    // Keep showing the last overlay while the next one loads, so the plots do not flash empty.
    placeholderData: keepPreviousData,
    staleTime: Infinity,
  })
}
