// Every form that carries a password must post: a submit before the page's scripts load would
// otherwise put the e-mail and password in the URL (history, server logs, Referer).
import fs from 'node:fs'
import path from 'node:path'
import { describe, expect, it } from 'vitest'

const appDir = path.join(__dirname, '../../../app')

function tsxFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name)
    return e.isDirectory() ? tsxFiles(p) : p.endsWith('.tsx') ? [p] : []
  })
}

/** The opening tags of every <form> in a component's source. */
const formTags = (src: string) => [...src.matchAll(/<form\b[^>]*>/g)].map((m) => m[0])

describe('forms that carry a password', () => {
  const withPassword = tsxFiles(appDir).filter((f) => {
    const src = fs.readFileSync(f, 'utf8')
    return src.includes('type="password"') && /<form\b/.test(src)
  })

  it('are found (sign-in, set-password, new user)', () => {
    const names = withPassword.map((f) => path.relative(appDir, f))
    expect(names).toEqual(expect.arrayContaining(['(auth)/signin/sign-in-form.tsx', '(auth)/set-password/set-password-form.tsx', '(app)/admin/users/new-user-form.tsx']))
  })

  it.each(withPassword.map((f) => [path.relative(appDir, f), f]))('%s declares method="post" on its form', (_name, file) => {
    const tags = formTags(fs.readFileSync(file, 'utf8'))
    expect(tags.length).toBeGreaterThan(0)
    for (const tag of tags) expect(tag).toMatch(/\bmethod="post"/)
  })
})
