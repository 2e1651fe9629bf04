import { SetPasswordForm } from './set-password-form'

export const metadata = { title: 'Set your password' }

export default async function SetPasswordPage(props: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const token = (await props.searchParams).token
  return (
    <div className="mx-auto mt-12 max-w-sm space-y-4">
      <h1 className="text-2xl font-bold">Set your password</h1>
      {typeof token === 'string' ? <SetPasswordForm token={token} /> : <p role="alert" className="error-text">This link is incomplete. Open the link from your e-mail again.</p>}
    </div>
  )
}
