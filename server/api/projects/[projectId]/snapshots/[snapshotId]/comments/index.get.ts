import { Comment } from '~~/server/database/models'
import type { CommentDto } from '#shared/types/review'

/** Every comment on a snapshot, oldest first; replies carry their thread's `parentId` (any member). */
export default defineEventHandler(async (event): Promise<CommentDto[]> => {
  const { project } = await requireProjectRole(event, 'viewer')
  const { snapshot } = await requireSnapshot(event, project.id)
  const comments = await Comment.findAll({ where: { snapshotId: snapshot.id }, order: [['createdAt', 'ASC']] })
  return toCommentDtos(comments)
})
