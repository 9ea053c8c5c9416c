import { createCommentSchema } from '#shared/schemas/review'
import { Comment } from '~~/server/database/models'
import type { CommentAnchor, CommentDto } from '#shared/types/review'

/**
 * Adds a comment or a reply (reviewers and up). A new thread is anchored to the snapshot,
 * one of its blocks or a frequency band; a reply joins its thread and takes its anchor.
 * Mentioned members get an e-mail; the answer names the mentions that matched no single member.
 */
export default defineEventHandler(async (event): Promise<CommentDto> => {
  const { user, project } = await requireProjectRole(event, 'reviewer')
  const body = await readBodyAs(event, createCommentSchema)
  const { snapshot, network } = await requireSnapshot(event, project.id)
  let anchor: CommentAnchor = body.anchor
  if (body.parentId) {
    const parent = await Comment.findOne({ where: { id: body.parentId, snapshotId: snapshot.id } })
    if (!parent) throw createError({ statusCode: 404, message: 'The comment you reply to is not on this snapshot.', data: { fields: { parentId: 'No such comment here.' } } })
    if (parent.parentId) throw createError({ statusCode: 400, message: 'Reply to the thread\'s first comment; replies are not nested further.', data: { fields: { parentId: 'Not a thread.' } } })
    anchor = parent.anchor as unknown as CommentAnchor
  } else if (anchor.kind === 'block' && !snapshot.document.blocks.some(b => b.id === (anchor as { blockId: string }).blockId)) {
    throw createError({ statusCode: 400, message: `The snapshot has no block named ${anchor.blockId}.`, data: { fields: { 'anchor.blockId': 'No such block in this snapshot.' } } })
  }
  const { mentioned: mentions, unmatched } = await readMentions(project.id, body.body, user.id)
  const comment = await Comment.create({
    snapshotId: snapshot.id, parentId: body.parentId ?? null, authorId: user.id, body: body.body,
    anchor: anchor as unknown as Record<string, unknown>, resolvedAt: null, mentions,
  })
  await mailMentions(event, { project, network, snapshot, comment, author: user, mentioned: mentions })
  setResponseStatus(event, 201)
  return { ...(await toCommentDtos([comment]))[0]!, unmatchedMentions: unmatched }
})
