import type { NextConfig } from 'next'

const nextConfig: NextConfig = {
  // A second build folder lets a test run build and serve while another build uses .next.
  distDir: process.env.NEXT_DIST_DIR || '.next',
  // PGlite ships WASM and data files that must be loaded from node_modules at run time, not bundled.
  serverExternalPackages: ['@electric-sql/pglite', '@node-rs/argon2', 'pg'],
  poweredByHeader: false,
  reactStrictMode: true,
  async headers() {
    return [
      {
        source: '/:path*',
        headers: [
          { key: 'X-Content-Type-Options', value: 'nosniff' },
          { key: 'X-Frame-Options', value: 'DENY' },
          { key: 'Referrer-Policy', value: 'same-origin' },
          { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=(), payment=()' },
          { key: 'Cross-Origin-Opener-Policy', value: 'same-origin' },
          // Sent on every answer, API included; browsers ignore it over plain http (the loopback demo).
          { key: 'Strict-Transport-Security', value: 'max-age=31536000; includeSubDomains' },
        ],
      },
    ]
  },
}

export default nextConfig
