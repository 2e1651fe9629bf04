import type { Metadata } from 'next'
import { redirect } from 'next/navigation'
import { getPageUser } from '@/app/_lib/auth/page-access'
import { SignInForm } from './sign-in-form'

export const metadata: Metadata = { title: 'Sign in' }

export default async function SignInPage() {
  if (await getPageUser()) redirect('/')
  return (
    <div className="mx-auto mt-12 max-w-sm">
      <h1 className="mb-1 text-2xl font-bold">Sign in</h1>
      <p className="mb-6 text-sm text-slate-600">Use the account your admin gave you.</p>
      <SignInForm />
      <p className="mt-3 text-sm">
        <a href="/forgot-password" className="text-accent hover:underline">Forgot your password?</a>
      </p>
    </div>
  )
}
