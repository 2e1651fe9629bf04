import { z } from 'zod'
import { MAX_ID } from './query'
import { atMost } from './text'
import { mapTableSchema } from '@/maps'

const message = z.string().trim().min(1, 'A message saying why is required').max(2000, 'The message must be at most 2,000 characters')
const notes = z.string().max(20_000, 'Notes must be at most 20,000 characters').default('')
const parentNumber = z.number({ error: 'parentNumber must be the number of the revision you started from' }).int().min(0)

export const createMapSchema = z.object({
  programId: z.number().int().positive('programId must name a vehicle program').max(MAX_ID, 'programId must name a vehicle program'),
  name: z.string().trim().min(1, 'Name is required').max(120, atMost('Name', 120)),
  kind: z.enum(['drive', 'regen'], { error: "kind must be 'drive' or 'regen'" }),
  description: z.string().max(2000, atMost('Description', 2000)).default(''),
  message: message.default('First revision'),
  table: mapTableSchema,
})

export const saveRevisionSchema = z.object({ parentNumber, message, notes, table: mapTableSchema })

/** The import's JSON body: 2 MB of CSV text, its escapes (a newline is two bytes in JSON) and the message. */
export const IMPORT_BODY_LIMIT = 5 * 1024 * 1024

/** 2 MB of CSV is far beyond the 64 × 64 cells a table may hold. */
export const importCsvSchema = z.object({
  parentNumber,
  message,
  notes,
  csv: z.string().min(1, 'The CSV text is empty').max(2_000_000, 'The CSV must be at most 2,000,000 characters (about 2 MB)'),
})

export type SaveRevisionInput = z.infer<typeof saveRevisionSchema>
