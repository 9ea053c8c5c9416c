import { StoredFile } from '~~/server/database/models'

/** Uploads a Touchstone file to the project (owners and editors); it must read as Touchstone. */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const upload = await readTouchstoneUpload(event)
  const existing = await StoredFile.findOne({ where: { projectId: project.id, name: upload.name }, attributes: ['id'] })
  if (existing) throw createError({ statusCode: 409, message: `The project already has a file named ${upload.name}; replace it with a new version instead.` })
  const file = await StoredFile.create({
    projectId: project.id, name: upload.name, contentType: 'application/octet-stream', size: upload.data.length, data: upload.data,
    summary: summaryOf(upload.parsed), createdBy: user.id, updatedBy: user.id,
  })
  await recordAudit('file.uploaded', user.id, project.id, { fileId: file.id, name: file.name })
  setResponseStatus(event, 201)
  return (await toStoredFileDtos([file]))[0]
})
