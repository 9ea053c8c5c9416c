// Nuxt configuration: one app, one process (pages, API and websocket on one port).
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
        await build({
          entryPoints: [join(nitro.options.rootDir, 'server/workers/solve-summary.ts')],
          outfile: join(nitro.options.output.serverDir, 'workers/solve-summary.mjs'),
          bundle: true,
          platform: 'node',
          format: 'esm',
          target: 'node20',
          minify: true,
          logLevel: 'warning',
        })
      },
    },
  },
  runtimeConfig: {
    databaseUrl: '',
    session: { maxAge: 60 * 60 * 24 * 7, cookie: { sameSite: 'lax', httpOnly: true } },
  },
})
