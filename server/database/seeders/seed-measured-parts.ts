import type { Sequelize } from 'sequelize'
import { Network, Project, StoredFile, User } from '../models'
import { portsFromFileName, readTouchstone } from '../../../shared/touchstone/read'
import { demoProjects } from './demo-scenario'
import { demoTouchstoneFiles } from './demo-touchstone'
import { measuredDemoNetworks } from './demo-measured-networks'

/**
 * Adds the invented amplifier and filter files and the networks that use them to the balanced-LNA
 * demo project. Runs once per database after the demo scenario (also on a database seeded before
 * these files existed); leaves out what is already there by name, and does nothing when the demo
 * project or its owner is gone.
 */
export async function seedMeasuredParts(sequelize: Sequelize): Promise<void> {
  const spec = demoProjects.find(p => p.key === 'balanced')!
  const project = await Project.findOne({ where: { name: spec.name }, order: [['createdAt', 'ASC']] })
  const owner = await User.findOne({ where: { email: 'tomas@quillmere.example' } })
  if (!project || !owner) return
  await sequelize.transaction(async (transaction) => {
    for (const file of demoTouchstoneFiles()) {
      if (await StoredFile.findOne({ where: { projectId: project.id, name: file.name }, transaction })) continue
      const parsed = readTouchstone(file.text, { ports: portsFromFileName(file.name) })
      const data = Buffer.from(file.text, 'latin1')
      await StoredFile.create({
        projectId: project.id, name: file.name, contentType: 'application/octet-stream', size: data.length, data, createdBy: owner.id, updatedBy: owner.id,
        summary: {
          ports: parsed.ports, startFrequency: parsed.frequencies[0]!, stopFrequency: parsed.frequencies[parsed.frequencies.length - 1]!,
          points: parsed.frequencies.length, impedances: [...parsed.impedances], version: parsed.version,
          parameter: parsed.options.parameter, format: parsed.options.format, noisePoints: parsed.noise.length,
        },
      }, { transaction })
    }
    for (const document of measuredDemoNetworks) {
      const name = document.name!
      if (await Network.findOne({ where: { projectId: project.id, name }, transaction })) continue
      await Network.create({ projectId: project.id, name, document, updatedBy: owner.id }, { transaction })
    }
  })
}
