/** Deletes a data file (owners and editors), refused while a network's data block uses it. Snapshots keep their own copies (table `snapshot_files`), so they neither block this nor lose their data. */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const file = await requireStoredFile(event, project.id)
  const users = await networksUsingFile(project.id, file.name)
  if (users.length) {
    throw createError({
      statusCode: 409,
      message: `${file.name} is used by ${users.map(n => `"${n.name}"`).join(', ')}; remove its data blocks there first.`,
      data: { networks: users },
    })
  }
  await file.destroy()
  await recordAudit('file.deleted', user.id, project.id, { fileId: file.id, name: file.name })
  return { deleted: true }
})
