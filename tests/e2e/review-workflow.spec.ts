import { expect, test } from './fixtures'
import { DEMO, editAndSave, openMapByName, openReview, signedInPage } from './helpers'

test('through two roles: submit, send back, resubmit, approve; release is of sets', async ({ browser }) => {
  test.setTimeout(180_000)
  const engineer = await signedInPage(browser, DEMO.calib)
  const mapId = await openMapByName(engineer, 'Road regen')
  const first = await editAndSave(engineer, mapId, 2, 6, '700', 'More lift-off regen at 15 km/h')
  await openReview(engineer, mapId, first)
  await engineer.getByRole('button', { name: 'Submit for review' }).click()
  await expect(engineer.getByTestId('revision-state')).toHaveText('Waiting for review')

  const lead = await signedInPage(browser, DEMO.lead)
  await lead.goto('/review')
  await lead.getByRole('link', { name: new RegExp(`Road regen r${first}$`) }).click()
  await lead.getByRole('button', { name: 'Send back' }).click()
  await expect(lead.getByRole('alert').filter({ hasText: 'needs a comment' })).toBeVisible()
  await lead.getByLabel('Comment (required to send back)').fill('Too much at 15 km/h on gravel; halve the step')
  await lead.getByRole('button', { name: 'Send back' }).click()
  await expect(lead.getByTestId('revision-state')).toHaveText('Sent back')

  const second = await editAndSave(engineer, mapId, 2, 6, '600', 'Halved the lift-off step at 15 km/h, as asked')
  await openReview(engineer, mapId, second)
  await engineer.getByRole('button', { name: 'Submit for review' }).click()
  await expect(engineer.getByTestId('revision-state')).toHaveText('Waiting for review')

  await lead.goto('/review')
  await lead.getByRole('link', { name: new RegExp(`Road regen r${second}$`) }).click()
  await lead.getByRole('button', { name: 'Approve', exact: true }).click()
  // A second step says what approving does; Escape steps back, and nothing has changed.
  await expect(lead.getByTestId('confirm-step')).toContainText(`Approve Road regen r${second} by`)
  await expect(lead.getByRole('button', { name: 'Yes, approve' })).toBeFocused()
  await lead.keyboard.press('Escape')
  await expect(lead.getByTestId('confirm-step')).toHaveCount(0)
  await expect(lead.getByRole('button', { name: 'Approve', exact: true })).toBeFocused()
  await expect(lead.getByTestId('revision-state')).toHaveText('Waiting for review')
  await lead.keyboard.press('Enter')
  await lead.getByRole('button', { name: 'Yes, approve' }).click()
  await expect(lead.getByTestId('revision-state')).toHaveText('Approved')
  // A revision is released only inside a map set (tests/e2e/set-release.spec.ts): the review page points there.
  await expect(lead.getByRole('link', { name: 'Make a set with this revision' })).toBeVisible()
})
