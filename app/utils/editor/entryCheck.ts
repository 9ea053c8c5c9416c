/**
 * Checks what someone typed into a field before it may enter the shared
 * document. An entry that evaluates becomes the new value; one that does not
 * stays a draft in its field with a message in the user's words, and the
 * document keeps its last good value.
 */
import type { NetworkDocument, ParamValue } from '~~/shared/network/types'
import { evaluateQuantity } from '~~/shared/network/expression'
import { evaluateParams, type QuantityParamSpec } from '~~/shared/network/params'
import { evaluateVariables, type VariablesOutcome } from '~~/shared/network/variables'
import { formatQuantity } from '~~/shared/network/format-quantity'
import { DOCUMENT_LIMITS } from '~~/shared/network/limits'
import type { QuantityKind } from '~~/shared/network/quantities'
import { BLOCK_MODELS } from '~~/shared/solver'
import { kindSpec } from './blockCatalog'
import { readParamInput } from './paramInput'

/** The field an entry belongs to. */
export type EntryTarget =
  | { kind: 'param', block: string, param: string }
  | { kind: 'variable', name: string }
  | { kind: 'sweep', field: 'start' | 'stop' | 'points' }
  | { kind: 'reference' }

export type EntryOutcome = { ok: true, value: ParamValue | undefined } | { ok: false, message: string }

/** A stable key for a target, used for drafts (with the network's id in front). */
export function entryKey(target: EntryTarget): string {
  switch (target.kind) {
    case 'param': return `block:${target.block}:${target.param}`
    case 'variable': return `variable:${target.name}`
    case 'sweep': return `sweep:${target.field}`
    default: return 'reference'
  }
}

/** Back from a key to its target; null for a key this version does not know. */
export function entryTarget(key: string): EntryTarget | null {
  const [kind, a, b] = key.split(':')
  if (kind === 'block' && a && b) return { kind: 'param', block: a, param: b }
  if (kind === 'variable' && a) return { kind: 'variable', name: a }
  if (kind === 'sweep' && (a === 'start' || a === 'stop' || a === 'points')) return { kind: 'sweep', field: a }
  if (kind === 'reference') return { kind: 'reference' }
  return null
}

/** An example value of each kind, for "is empty: enter a value such as …". */
const EXAMPLES: Record<QuantityKind, string> = {
  impedance: '50 Ω', resistance: '50 Ω', inductance: '10 nH', capacitance: '1 pF', frequency: '2.45 GHz', length: '10 mm',
  angle: '90', decibel: '3', ratio: '1', count: '1', conductivity: '5.8e7',
}

const SWEEP_LABELS = { start: 'Start frequency', stop: 'Stop frequency', points: 'Number of points' } as const

/** The words a field is called by on screen. */
export function entryLabel(doc: NetworkDocument, target: EntryTarget): string {
  switch (target.kind) {
    case 'param': {
      const block = doc.blocks.find(b => b.id === target.block)
      const field = block && kindSpec(block.type)?.fields.find(f => f.param === target.param)
      const label = field?.label ?? target.param
      return label.charAt(0).toUpperCase() + label.slice(1)
    }
    case 'variable': return `Variable ${target.name}`
    case 'sweep': return SWEEP_LABELS[target.field]
    default: return 'Reference impedance'
  }
}

function finite(text: string, label: string): EntryOutcome | null {
  const value = readParamInput(text)
  if (typeof value === 'number' && !Number.isFinite(value)) return { ok: false, message: `${label} (${text.trim()}) is too large to be a number` }
  return null
}

/** Reworded evaluator messages: "is not a finite number" says why in the user's terms. */
function reword(error: string): string {
  return error.replace(/is not a finite number/, 'is too large (or too small) to be a number')
}

// A slider drag checks entry after entry against the same variables: the last evaluation is kept.
let lastVariables: { key: string, outcome: VariablesOutcome } | undefined

/** The document's variables evaluated, reused while they stay the same. */
function variablesOf(doc: NetworkDocument): VariablesOutcome {
  const key = JSON.stringify(doc.variables ?? {})
  if (lastVariables?.key !== key) lastVariables = { key, outcome: evaluateVariables(doc.variables) }
  return lastVariables.outcome
}

function quantity(doc: NetworkDocument, text: string, spec: QuantityParamSpec, label: string): EntryOutcome {
  const bad = finite(text, label)
  if (bad) return bad
  const value = readParamInput(text)
  if (value === undefined) return { ok: false, message: `${label} is empty: enter a value such as ${EXAMPLES[spec.kind]}` }
  const vars = variablesOf(doc)
  const outcome = evaluateParams('entry', 'entry', { v: value }, { v: spec }, { scope: vars.scope, failed: vars.failed, referenceImpedance: 50 })
  const error = outcome.evaluated.v?.error
  return error ? { ok: false, message: `${label} ${reword(error)}` } : { ok: true, value }
}

function checkParam(doc: NetworkDocument, target: { block: string, param: string }, text: string, label: string): EntryOutcome {
  const block = doc.blocks.find(b => b.id === target.block)
  if (!block) return { ok: false, message: `Block ${target.block} is no longer in the network` }
  const spec = BLOCK_MODELS[block.type]?.params[target.param]
  const field = kindSpec(block.type)?.fields.find(f => f.param === target.param)
  const value = readParamInput(text)
  // Blank clears a parameter that means something when absent (a default, "none", "reference"); any other must hold a value.
  const blankMeansSomething = !field?.required && (field?.placeholder !== undefined || (spec !== undefined && 'default' in spec && spec.default !== undefined))
  if (value === undefined && blankMeansSomething) return { ok: true, value: undefined }
  if (!spec || spec.kind === 'choice' || spec.kind === 'text') {
    return value === undefined ? { ok: false, message: `${label} is empty: enter a value` } : { ok: true, value }
  }
  return quantity(doc, text, spec, label)
}

function checkVariable(doc: NetworkDocument, name: string, text: string, label: string): EntryOutcome {
  const bad = finite(text, label)
  if (bad) return bad
  const value = readParamInput(text)
  if (value === undefined) return { ok: false, message: `${label} is empty: enter a value such as 2.45 GHz or 50 Ω` }
  const error = evaluateVariables({ ...doc.variables, [name]: value }).evaluated[name]?.error
  return error ? { ok: false, message: `${label} ${reword(error)}` } : { ok: true, value }
}

function evaluatedSweepEnd(doc: NetworkDocument, field: 'start' | 'stop'): number | undefined {
  const written = doc.sweep?.[field]
  if (written === undefined) return undefined
  const vars = variablesOf(doc)
  const outcome = evaluateQuantity(written, 'frequency', vars.scope, vars.failed)
  return outcome.ok ? outcome.value : undefined
}

function checkSweep(doc: NetworkDocument, field: 'start' | 'stop' | 'points', text: string, label: string): EntryOutcome {
  if (field === 'points') {
    const t = text.trim()
    const most = DOCUMENT_LIMITS.sweepPoints
    if (t === '') return { ok: false, message: `${label} is empty: enter a whole number such as 201` }
    const n = Number(t)
    if (!/^\d+$/.test(t) || !Number.isSafeInteger(n)) return { ok: false, message: `${label} must be a whole number such as 201 (got ${t})` }
    if (n < 1 || n > most) return { ok: false, message: `${label} must be from 1 to ${most.toLocaleString('en-GB')} (got ${t})` }
    return { ok: true, value: n }
  }
  const outcome = quantity(doc, text, { kind: 'frequency', min: 0 }, label)
  if (!outcome.ok) return outcome
  const vars = variablesOf(doc)
  const value = evaluateQuantity(outcome.value!, 'frequency', vars.scope, vars.failed)
  if (!value.ok) return { ok: false, message: `${label} ${value.error}` }
  const other = evaluatedSweepEnd(doc, field === 'start' ? 'stop' : 'start')
  const points = doc.sweep?.points ?? 201
  const shown = formatQuantity(value.value, 'frequency')
  if (other !== undefined && points > 1) {
    if (field === 'stop' && value.value < other) return { ok: false, message: `${label} (${shown}) must not be below the start frequency (${formatQuantity(other, 'frequency')})` }
    if (field === 'start' && value.value > other) return { ok: false, message: `${label} (${shown}) must not be above the stop frequency (${formatQuantity(other, 'frequency')})` }
  }
  if (doc.sweep?.spacing === 'log' && field === 'start' && !(value.value > 0)) return { ok: false, message: `${label} must be above 0 Hz for a log sweep` }
  return outcome
}

/** Whether `text` may become the value of `target` in `doc`, and the value it becomes. */
export function checkEntry(doc: NetworkDocument, target: EntryTarget, text: string): EntryOutcome {
  const label = entryLabel(doc, target)
  switch (target.kind) {
    case 'param': return checkParam(doc, target, text, label)
    case 'variable': return checkVariable(doc, target.name, text, label)
    case 'sweep': return checkSweep(doc, target.field, text, label)
    default: return quantity(doc, text, { kind: 'impedance', above: 0 }, label)
  }
}

/** Whether the target still exists in the document (a draft of a deleted block is dropped). */
export function entryExists(doc: NetworkDocument, target: EntryTarget): boolean {
  if (target.kind === 'param') return doc.blocks.some(b => b.id === target.block)
  if (target.kind === 'variable') return target.name in (doc.variables ?? {})
  return true
}
