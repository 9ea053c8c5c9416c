/** Replaces a data file with a new version under the same name (owners and editors); it must read as Touchstone. */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const file = await requireStoredFile(event, project.id)
  const upload = await readTouchstoneUpload(event)
  await file.update({ data: upload.data, size: upload.data.length, summary: summaryOf(upload.parsed), version: file.version + 1, updatedBy: user.id, updatedAt: new Date() })
  await recordAudit('file.replaced', user.id, project.id, { fileId: file.id, name: file.name, version: file.version, uploadedAs: upload.name })
  return (await toStoredFileDtos([file]))[0]
})
