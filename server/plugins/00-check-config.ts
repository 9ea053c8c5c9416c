/**
 * Refuses to serve without a strong session secret: without it the server would
 * start and then fail on the first sign-in.
 */
export default defineNitroPlugin(() => {
  const secret = process.env.NUXT_SESSION_PASSWORD ?? ''
  if (secret.length < 32) {
    console.error('Portwright: NUXT_SESSION_PASSWORD must be set to at least 32 characters; refusing to start.')
    process.exit(1)
  }
  if (!useRuntimeConfig().databaseUrl && !process.env.NUXT_DATABASE_URL) {
    console.error('Portwright: NUXT_DATABASE_URL is not set; refusing to start.')
    process.exit(1)
  }
})
