/** Ready-made networks a project can start from, each a version-1.1 document with its spec. */
import { balancedAmplifier } from './balanced-amplifier'
import { beamMatrix4x4 } from './beam-matrix-4x4'
import { corporateDivider } from './corporate-divider'
import { quadratureSplit } from './quadrature-split'
import { ringHybridFeed } from './ring-hybrid-feed'
import { twoSectionQuadrature } from './two-section-quadrature'
import type { NetworkTemplate } from './types'

export type { NetworkTemplate, TemplateArray, TemplateFile, TemplatePort } from './types'
export { renameBlocks } from './rename-blocks'
export { templateDataResolver } from './template-data'

/** Every template in the order the gallery shows them. */
export const TEMPLATES: readonly NetworkTemplate[] = [quadratureSplit, twoSectionQuadrature, ringHybridFeed, corporateDivider, beamMatrix4x4, balancedAmplifier]

/** A template by its slug. */
export function findTemplate(slug: string): NetworkTemplate | undefined {
  return TEMPLATES.find(t => t.slug === slug)
}
