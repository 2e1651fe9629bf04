import { ForgotPasswordForm } from './forgot-password-form'

export const metadata = { title: 'Forgot your password' }

export default function ForgotPasswordPage() {
  return (
    <div className="mx-auto mt-12 max-w-sm space-y-4">
      <h1 className="text-2xl font-bold">Forgot your password?</h1>
      <p className="text-sm text-slate-600">We will e-mail you a link to set a new one. It works once and expires in an hour.</p>
      <ForgotPasswordForm />
    </div>
  )
}
