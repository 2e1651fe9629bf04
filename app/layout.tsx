import type { Metadata } from 'next'
import localFont from 'next/font/local'
import type { ReactNode } from 'react'
import { Providers } from './_components/providers'
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

// The page frame (header, main) belongs to the route groups: (app) for signed-in pages, (auth) for the rest.
export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={inter.variable}>
      <body className="min-h-screen font-sans antialiased">
        <Providers>{children}</Providers>
      </body>
    </html>
  )
}
