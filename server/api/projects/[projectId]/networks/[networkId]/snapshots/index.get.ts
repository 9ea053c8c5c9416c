import { Snapshot } from '~~/server/database/models'

/** The network's snapshots, newest first, with author, summary and latest review (any member). */
export default defineEventHandler(async (event) => {
  const { project } = await requireProjectRole(event, 'viewer')
  const network = await requireNetwork(event, project.id)
  const snapshots = await Snapshot.findAll({
    where: { networkId: network.id },
    attributes: { exclude: ['document', 'networks'] },
    order: [['createdAt', 'DESC']],
  })
  return snapshotListItems(snapshots)
})
