// The accessibility check every page of a role's walk gets: axe-core on the whole page, and the
// test fails on any critical or serious violation, listing each rule with where it was found.
import AxeBuilder from '@axe-core/playwright'
import { expect, type Page } from '@playwright/test'

/** Critical and serious axe violations on the page as it is now, one line per rule. */
export async function accessibilityProblems(page: Page): Promise<string[]> {
  const result = await new AxeBuilder({ page }).analyze()
  return result.violations
    .filter((v) => v.impact === 'critical' || v.impact === 'serious')
    .map((v) => `${v.impact} ${v.id} ×${v.nodes.length}: ${v.nodes.slice(0, 3).map((n) => n.target.join(' ')).join(' | ')}`)
}

export async function expectAccessible(page: Page, what: string) {
  expect(await accessibilityProblems(page), `axe on ${what}`).toEqual([])
}
