import type { Sequelize } from 'sequelize'
import { Membership, Network, Project, ProjectSubstrate, User } from '../models'
import { DEMO_PASSWORD, demoPeople, demoProjects, type DemoPersonKey } from './demo-scenario'
import { demoNetworks } from './demo-networks'
import { demoSubstrates } from './demo-substrates'

/** Writes the demo scenario in one transaction. */
export async function seedDemo(sequelize: Sequelize, hash: (password: string) => Promise<string>): Promise<void> {
  const passwordHash = await hash(DEMO_PASSWORD)
  await sequelize.transaction(async (transaction) => {
    const ids = {} as Record<DemoPersonKey, string>
    for (const person of demoPeople) {
      const user = await User.create({ email: person.email, name: person.name, isAdmin: person.isAdmin, passwordHash }, { transaction })
      ids[person.key] = user.id
    }
    for (const spec of demoProjects) {
      const owner = Object.entries(spec.members).find(([, role]) => role === 'owner')![0] as DemoPersonKey
      const project = await Project.create({ name: spec.name, description: spec.description, createdBy: ids[owner] }, { transaction })
      for (const [key, role] of Object.entries(spec.members)) {
        await Membership.create({ projectId: project.id, userId: ids[key as DemoPersonKey]!, role }, { transaction })
      }
      for (const document of demoNetworks[spec.key]) {
        await Network.create({ projectId: project.id, name: document.name ?? 'Untitled network', document, updatedBy: ids[owner] }, { transaction })
      }
      for (const board of demoSubstrates[spec.key]) {
        await ProjectSubstrate.create({ ...board, projectId: project.id, updatedBy: ids[owner] }, { transaction })
      }
    }
  })
}
