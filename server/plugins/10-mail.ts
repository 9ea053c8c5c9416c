/**
 * Opens the mail path at start-up, so the local stand-in SMTP server (development and
 * tests, when no PORTWRIGHT_SMTP_HOST is given) is listening before the first message.
 */
export default defineNitroPlugin((nitroApp) => {
  startMailer().catch((error: Error) => {
    console.error(`Portwright: the mail path could not be opened: ${error.message}`)
  })
  nitroApp.hooks.hook('close', async () => {
    await stopMailer()
  })
})
