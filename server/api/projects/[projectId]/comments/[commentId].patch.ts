import { updateCommentSchema } from '#shared/schemas/review'
import type { CommentDto, UnmatchedMention } from '#shared/types/review'

/**
 * Edits a comment's words (its author only) or resolves / reopens a thread (reviewers and
 * up). Members newly mentioned by an edit get an e-mail; those mentioned before do not.
 */
export default defineEventHandler(async (event): Promise<CommentDto> => {
  const { user, project } = await requireProjectRole(event, 'reviewer')
  const body = await readBodyAs(event, updateCommentSchema)
  const { comment, snapshot, network } = await requireComment(event, project.id)
  if (body.body !== undefined && comment.authorId !== user.id) {
    throw createError({ statusCode: 403, message: 'Only its author can change the words of a comment.' })
  }
  if (body.resolved !== undefined && comment.parentId) {
    throw createError({ statusCode: 400, message: 'Resolve or reopen the thread\'s first comment; a reply is not a thread.', data: { fields: { resolved: 'Not a thread.' } } })
  }
  let newlyMentioned: string[] = []
  let unmatched: UnmatchedMention[] = []
  if (body.body !== undefined && body.body !== comment.body) {
    const read = await readMentions(project.id, body.body, user.id)
    const mentions = read.mentioned
    unmatched = read.unmatched
    newlyMentioned = mentions.filter(id => !(comment.mentions ?? []).includes(id))
    comment.set({ body: body.body, mentions, editedAt: new Date() })
  }
  if (body.resolved === true && !comment.resolvedAt) comment.set({ resolvedAt: new Date(), resolvedBy: user.id })
  if (body.resolved === false && comment.resolvedAt) comment.set({ resolvedAt: null, resolvedBy: null })
  await comment.save()
  await mailMentions(event, { project, network, snapshot, comment, author: user, mentioned: newlyMentioned })
  return { ...(await toCommentDtos([comment]))[0]!, unmatchedMentions: unmatched }
})
