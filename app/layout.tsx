import type { Metadata } from 'next'
import localFont from 'next/font/local'
import type { ReactNode } from 'react'
import { optionalPageUser } from './_lib/auth/page-access'
import { Providers } from './_components/providers'
import { SiteHeader } from './_components/site-header'
import './globals.css'

// Shipped with the app from an npm font package: nothing is fetched at build or run time.
const inter = localFont({
  src: '../node_modules/@fontsource-variable/inter/files/inter-latin-wght-normal.woff2',
  variable: '--font-inter',
  display: 'swap',
})

export const metadata: Metadata = {
  title: { default: 'Mapwright', template: '%s · Mapwright' },
  description: 'Calibration notebook for heavy electric truck drive and regen torque maps',
}

export default async function RootLayout({ children }: { children: ReactNode }) {
  const user = await optionalPageUser()
  return (
    <html lang="en" className={inter.variable}>
      <body className="min-h-screen font-sans antialiased">
        <Providers>
          <SiteHeader user={user} />
          <main className="mx-auto max-w-7xl px-4 py-6">{children}</main>
        </Providers>
      </body>
    </html>
  )
}
