/** Downloads a data file as stored (every member). */
export default defineEventHandler(async (event) => {
  const { project } = await requireProjectRole(event, 'viewer')
  const file = await requireStoredFile(event, project.id)
  setResponseHeader(event, 'content-type', 'application/octet-stream')
  // The name passed the upload's allow-list (letters, digits, spaces, . _ ( ) -), so it is safe in the header.
  setResponseHeader(event, 'content-disposition', `attachment; filename="${file.name}"`)
  setResponseHeader(event, 'x-content-type-options', 'nosniff')
  return file.data
})
