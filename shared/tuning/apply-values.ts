import type { NetworkDocument } from '../network/types'
import type { ValueTarget } from './value-key'

/**
 * A copy of the document with each target set to its value (SI): a block parameter becomes a number,
 * a variable with a unit becomes "value unit" so expressions that use it keep their dimension.
 * The input document is left as it is.
 */
export function applyValues(document: NetworkDocument, targets: readonly ValueTarget[], values: ArrayLike<number>): NetworkDocument {
  const copy: NetworkDocument = { ...document, blocks: document.blocks.slice(), variables: document.variables ? { ...document.variables } : undefined }
  targets.forEach((target, i) => {
    const value = values[i]!
    if ('variable' in target.where) {
      const unit = 'variableUnit' in target.unit ? target.unit.variableUnit : null
      copy.variables![target.where.variable] = unit === null ? value : `${value} ${unit}`
      return
    }
    const { block, param } = target.where
    const original = copy.blocks[block]!
    // Only the touched block is copied; the rest are shared with the input, which is never changed.
    const changed = copy.blocks[block] === document.blocks[block] ? { ...original, params: { ...original.params } } : original
    changed.params[param] = value
    copy.blocks[block] = changed
  })
  if (copy.variables === undefined) delete copy.variables
  return copy
}
