'use client'
import { useCallback, useState } from 'react'
import type { z } from 'zod'
import { browserStorage, readDraft, removeDraft, writeDraft } from './local-draft'

/**
 * One locally kept draft for a form in the browser: what was restored on first render (already
 * checked against `schema`, else null), and how to store or drop it. For client-only components
 * (loaded without SSR), so the stored draft can seed the initial state.
 */
export function useLocalDraft<S extends z.ZodType>(key: string, schema: S) {
  const [restored] = useState(() => readDraft(browserStorage(), key, schema))
  const save = useCallback((value: z.output<S>) => writeDraft(browserStorage(), key, value), [key])
  const clear = useCallback(() => removeDraft(browserStorage(), key), [key])
  return { restored, save, clear }
}
