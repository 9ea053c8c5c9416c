/** Opens the database at start-up (so models are bound before any route runs) and closes it on shutdown. */
export default defineNitroPlugin((nitroApp) => {
  useDatabase()
  nitroApp.hooks.hook('close', async () => {
    await closeDatabase()
  })
})
