import { existingLiveHub } from '~~/server/live/hub'

/** Named to sort before 01-database: close hooks run in order, and the last merges need the database. On shutdown, live rooms merge their logs into the stored state (so the JSON documents are current) before the database closes. */
export default defineNitroPlugin((nitroApp) => {
  nitroApp.hooks.hook('close', async () => {
    await existingLiveHub()?.stop()
  })
})
