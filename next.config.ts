import fs from 'node:fs'
import path from 'node:path'
import type { NextConfig } from 'next'

/**
 * A git worktree may share another checkout's node_modules through a symlink. Turbopack resolves
 * only inside its root, so the root widens to the folder holding both; a plain checkout keeps the default.
 */
function turbopackRoot(): string | undefined {
  const here = process.cwd()
  let modules: string
  try { modules = fs.realpathSync(path.join(here, 'node_modules')) } catch { return undefined }
  if (path.dirname(modules) === here) return undefined
  let root = here
  while (!modules.startsWith(root + path.sep)) root = path.dirname(root)
  return root
}

const nextConfig: NextConfig = {
  // A second build folder lets a test run build and serve while another build uses .next.
  distDir: process.env.NEXT_DIST_DIR || '.next',
  turbopack: {
    root: turbopackRoot(),
    // Plotly's trace registry imports the map library's stylesheet; the app registers no map trace.
    resolveAlias: { 'maplibre-gl/dist/maplibre-gl.css': './app/_components/plots/no-map-styles.css' },
  },
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
