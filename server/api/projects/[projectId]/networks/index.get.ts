import { Network } from '~~/server/database/models'

/** The project's networks (summaries, no documents), for any member. */
export default defineEventHandler(async (event) => {
  const { project } = await requireProjectRole(event, 'viewer')
  const networks = await Network.findAll({
    where: { projectId: project.id },
    attributes: { exclude: ['document'] },
    order: [['name', 'ASC']],
  })
  return networks.map(toNetworkSummaryDto)
})
