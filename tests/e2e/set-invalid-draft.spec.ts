import { expect, test } from './fixtures'
import { DEMO, signIn } from './helpers'

test('a set holding a draft the C header refuses still opens, and says why it has no test package', async ({ page }) => {
  await signIn(page, DEMO.calib)
  const maps = (await (await page.request.get('/api/maps')).json()).maps as { id: number; name: string; kind: string }[]
  const drive = maps.find((m) => m.name === 'Road drive')!
  const { latest } = await (await page.request.get(`/api/maps/${drive.id}`)).json()
  // Full pedal asking for less than the row below it at standstill: a pedal-order error (a draft may still be saved).
  const table = structuredClone(latest.table)
  const last = table.values.length - 1
  table.values[last][0] = Math.max(0, table.values[last - 1][0] - 100)
  const saved = await page.request.post(`/api/maps/${drive.id}/revisions`, { data: { parentNumber: latest.number, message: 'Draft with a pedal-order slip, for the set page', notes: '', table } })
  expect(saved.status()).toBe(201)
  try {
    const regenMap = maps.find((m) => m.name === 'Road regen')!
    const regen = (await (await page.request.get(`/api/maps/${regenMap.id}`)).json()).latest.id as number
    const made = await page.request.post('/api/sets', { data: { driveRevisionId: (await saved.json()).revision.id, regenRevisionId: regen } })
    expect(made.status()).toBe(201)
    const res = await page.goto(`/sets/${(await made.json()).set.id}`)
    expect(res?.status()).toBe(200)
    await expect(page.getByTestId('test-package-refused')).toContainText('No test package')
  } finally {
    // Leave the demo map as it was for the specs after this one, whatever happened above.
    const again = (await (await page.request.get(`/api/maps/${drive.id}`)).json()).latest
    await page.request.post(`/api/maps/${drive.id}/revisions`, { data: { parentNumber: again.number, message: 'Back to the previous table', notes: '', table: latest.table } })
  }
})
