/**
 * Problems as the editor shows them: the solver names fields the way the
 * document spells them (`sweep.stop`, `referenceImpedance`, raw hertz), which
 * the command line needs; on screen they read as the fields' labels with SI
 * prefixes ("Stop frequency (500 MHz) …").
 */
import type { NetworkDocument, Problem } from '~~/shared/network/types'
import { formatQuantity } from '~~/shared/network/format-quantity'
import { kindSpec } from './blockCatalog'

const NAMES: ReadonlyArray<readonly [RegExp, string]> = [
  [/\bsweep\.start\b/g, 'start frequency'],
  [/\bsweep\.stop\b/g, 'stop frequency'],
  [/\bsweep\.points\b/g, 'number of points'],
  [/\bsweep\.spacing\b/g, 'sweep spacing'],
  [/\breferenceImpedance\b/g, 'reference impedance'],
  [/\bspec\.band\.start\b/g, 'spec band start'],
  [/\bspec\.band\.stop\b/g, 'spec band stop'],
  [/\bspec\.center\b/g, 'spec centre'],
]

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1)

/** A message with document names turned into labels and bare hertz into SI ("500000000 Hz" → "500 MHz"). */
export function plainWords(message: string): string {
  let text = message.replace(/(-?\d+(?:\.\d+)?(?:e[+-]?\d+)?) Hz\b/gi, (_m, n: string) => formatQuantity(Number(n), 'frequency'))
  for (const [pattern, words] of NAMES) text = text.replace(pattern, words)
  return capitalise(text)
}

/** Label of a problem's field: the inspector's label for a block parameter, the settings' words otherwise. */
export function fieldLabel(doc: NetworkDocument, problem: Problem): string | undefined {
  if (!problem.field) return undefined
  if (problem.block) {
    const block = doc.blocks.find(b => b.id === problem.block)
    return (block && kindSpec(block.type)?.fields.find(f => f.param === problem.field)?.label) ?? problem.field
  }
  return plainWords(problem.field)
}

/** The message without the "block X (type), field: " lead the solver puts in front (the list shows block and field itself). */
export function problemMessage(problem: Problem): string {
  let text = problem.message
  if (problem.block) text = text.replace(new RegExp(`^block ${problem.block.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}( \\([^)]*\\))?(, [^:]+)?: `), '')
  return plainWords(text)
}
