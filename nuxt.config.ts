// Nuxt configuration: one app, one process (pages, API and websocket on one port).
import { existsSync, statSync } from 'node:fs'
import { join } from 'node:path'

// PORTWRIGHT_BUILD_NAME gives a build its own folders, so that two builds in one checkout
// (say, a test run and a development server) do not overwrite each other.
const buildName = process.env.PORTWRIGHT_BUILD_NAME
const suffix = buildName ? `-${buildName}` : ''

export default defineNuxtConfig({
  compatibilityDate: '2026-11-01',
  devtools: { enabled: false },
  telemetry: false,
  buildDir: `.nuxt${suffix}`,
  modules: ['@pinia/nuxt', '@nuxtjs/tailwindcss', 'nuxt-auth-utils'],
  css: ['@fontsource/inter/400.css', '@fontsource/inter/500.css', '@fontsource/inter/600.css', '@fontsource/inter/700.css', '~/assets/css/main.css'],
  app: {
    head: {
      title: 'Portwright',
      htmlAttrs: { lang: 'en' },
      meta: [{ name: 'description', content: 'Design and review RF feed networks: hybrids, dividers, beamforming matrices.' }],
      link: [{ rel: 'icon', type: 'image/svg+xml', href: '/favicon.svg' }],
    },
  },
  typescript: { strict: true },
  tailwindcss: { cssPath: false, viewer: false },
  nitro: {
    experimental: { websocket: true },
    output: { dir: `.output${suffix}` },
    hooks: {
      // Server-side solves run in worker threads (server/utils/solve-pool.ts); their entry is bundled on its own
      // beside the server's, because a worker cannot load a chunk of Nitro's bundle.
      async compiled(nitro) {
        const { build } = await import('esbuild')
        for (const name of ['solve-summary', 'solve-api', 'read-touchstone', 'check-job']) {
          await build({
            entryPoints: [join(nitro.options.rootDir, `server/workers/${name}.ts`)],
            outfile: join(nitro.options.output.serverDir, `workers/${name}.mjs`),
            bundle: true,
            platform: 'node',
            format: 'esm',
            target: 'node20',
            minify: true,
            logLevel: 'warning',
            // The server's own aliases (`#shared/…`, `~~/…`), resolved as Nitro resolves them.
            plugins: [{
              name: 'portwright-aliases',
              setup(b) {
                b.onResolve({ filter: /^(#shared|~~)\// }, ({ path }) => {
                  const base = join(nitro.options.rootDir, path.startsWith('#shared/') ? `shared/${path.slice(8)}` : path.slice(3))
                  return { path: [`${base}.ts`, base, join(base, 'index.ts')].find(f => existsSync(f) && statSync(f).isFile()) ?? `${base}.ts` }
                })
              },
            }],
          })
        }
      },
    },
  },
  // Security headers on every answer, static files included (OWASP ASVS 5.0, V3/V13): no content-type sniffing,
  // no framing by other sites, no full URLs leaked to other origins, and a strict default content security
  // policy. Rendered pages get their own policy with the hashes of their inline scripts
  // (server/plugins/page-content-policy.ts).
  routeRules: {
    '/**': {
      headers: {
        'X-Content-Type-Options': 'nosniff',
        'X-Frame-Options': 'DENY',
        'Referrer-Policy': 'strict-origin-when-cross-origin',
        'Cross-Origin-Opener-Policy': 'same-origin',
        'Permissions-Policy': 'camera=(), microphone=(), geolocation=()',
        'Content-Security-Policy': "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'",
      },
    },
  },
  runtimeConfig: {
    databaseUrl: '',
    session: { maxAge: 60 * 60 * 24 * 7, cookie: { sameSite: 'lax', httpOnly: true } },
  },
})
