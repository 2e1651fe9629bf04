import { expect, test } from './fixtures'
import { DEMO, signIn } from './helpers'

// A map named with markup, shown in a plot title: the name must stay text (no link, no bold).
test('plot titles show names as text, and the toolbar keeps only local tools', async ({ page }) => {
  test.setTimeout(120_000)
  await signIn(page, DEMO.calib)
  const { maps } = await (await page.request.get('/api/maps')).json()
  const base = maps.find((m: { kind: string; latestNumber: number | null }) => m.kind === 'drive' && m.latestNumber)
  const { revision } = await (await page.request.get(`/api/maps/${base.id}/revisions/latest`)).json()
  const name = `<a href="https://evil.example/">Linked</a> <b>map</b> ${Date.now()}`
  const created = await page.request.post('/api/maps', {
    data: { programId: base.programId, name, kind: 'drive', table: revision.table, message: 'markup in the name' },
  })
  expect(created.status()).toBe(201)
  const { mapId } = await created.json()

  await page.goto(`/programs/${base.programId}/physics?map=${mapId}&rev=1`)
  const plot = page.locator('.js-plotly-plot').first()
  await expect(plot).toBeVisible({ timeout: 30_000 })
  // The title shows the name literally, and no element inside any plot is a link.
  await expect(plot.locator('.gtitle')).toContainText('<a href="https://evil.example/">Linked</a>')
  await expect(page.locator('.js-plotly-plot a[href*="evil.example"]')).toHaveCount(0)
  await expect(page.locator('.js-plotly-plot .gtitle b')).toHaveCount(0)

  // The mode bar: zoom, pan, rotate, reset and PNG download; nothing that uploads, no vendor logo.
  await plot.hover()
  const bar = plot.locator('.modebar')
  const titles = await bar.locator('.modebar-btn').evaluateAll((els) => els.map((e) => e.getAttribute('data-title') ?? ''))
  expect(titles.join('|')).toMatch(/Zoom/)
  expect(titles.join('|')).toMatch(/Pan/)
  expect(titles.join('|')).toMatch(/rotation/i)
  expect(titles.join('|')).toMatch(/Reset/)
  expect(titles.join('|')).toMatch(/Download plot as a? ?png/i)
  for (const t of titles) expect(t).not.toMatch(/cloud|chart studio|edit in|plotly/i)
  await expect(page.locator('.modebar-btn--logo, .modebar a[href*="plotly"]')).toHaveCount(0)
})
