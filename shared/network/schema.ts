import { z } from 'zod'
import { DOCUMENT_LIMITS as LIMITS } from './limits'
import type { NetworkDocument, Problem } from './types'

const most = (n: number) => n.toLocaleString('en-GB')

const paramValue = z.union(
  [z.number(), z.string().max(500, 'expression is too long (500 characters at most)')],
  { error: 'must be a number or an expression string' },
)

/** Where the editor draws a block; extra keys are kept for later editor features. */
export const blockLayoutSchema = z.looseObject({
  x: z.number(),
  y: z.number(),
  rotation: z.union([z.literal(0), z.literal(90), z.literal(180), z.literal(270)]).optional(),
  flip: z.boolean().optional(),
})

/** One block: id, type name and parameters; the type itself is checked against the registry later. */
export const blockSpecSchema = z.looseObject({
  id: z.string().min(1, 'block id must not be empty').max(LIMITS.blockIdLength, `a block id may have at most ${LIMITS.blockIdLength} characters`),
  type: z.string().min(1, 'block type must not be empty').max(40, 'block type is too long (40 characters at most)'),
  params: z.record(z.string(), paramValue).default({})
    .refine(p => Object.keys(p).length <= LIMITS.paramsPerBlock, `a block may have at most ${LIMITS.paramsPerBlock} parameters`)
    .refine(p => Object.keys(p).every(k => k.length <= 40), 'a parameter name may have at most 40 characters'),
  layout: blockLayoutSchema.optional(),
})

/** A wire: two terminals written BLOCK.N. */
const terminal = z.string().max(LIMITS.terminalLength, `a terminal may have at most ${LIMITS.terminalLength} characters`)
export const wireSchema = z.tuple([terminal, terminal], { error: 'a wire must be a pair of terminals such as ["A.1", "B.2"]' })

/** Sweep as written; values are evaluated later so expressions are allowed. */
export const sweepSchema = z.looseObject({
  start: paramValue,
  stop: paramValue,
  points: z.number().int('points must be a whole number').min(1, 'points must be at least 1')
    .max(LIMITS.sweepPoints, `a sweep may have at most ${most(LIMITS.sweepPoints)} points`).optional(),
  spacing: z.enum(['linear', 'log']).optional(),
})

/** A named planar substrate. */
export const substrateSchema = z.looseObject({
  permittivity: paramValue,
  height: paramValue,
  thickness: paramValue.optional(),
  lossTangent: paramValue.optional(),
  conductivity: paramValue.optional(),
  roughness: paramValue.optional(),
})

const port = z.number({ error: 'a port must be a number' }).int('a port must be a whole number').min(1, 'ports count from 1')
const portPair = z.tuple([port, port], { error: 'must be two ports, such as [2, 3]' })
const level = z.number({ error: 'must be a number of decibels' }).finite('must be a finite number')

/** One spec condition (contract 1.1); the measure names which fields it takes. */
export const specConditionSchema = z.discriminatedUnion('measure', [
  z.looseObject({ measure: z.literal('returnLoss'), port, min: level }),
  z.looseObject({ measure: z.literal('vswr'), port, max: z.number({ error: 'must be a number' }).min(1, 'a VSWR is at least 1') }),
  z.looseObject({ measure: z.enum(['insertionLoss', 'isolation', 'coupling']), from: port, to: port, min: level.optional(), max: level.optional() }),
  z.looseObject({ measure: z.literal('amplitudeImbalance'), from: port, to: portPair, max: z.number({ error: 'must be a number of decibels' }).min(0, 'must not be negative') }),
  z.looseObject({ measure: z.literal('phaseDifference'), from: port, to: portPair, target: z.number({ error: 'must be a number of degrees' }).finite(), tolerance: z.number({ error: 'must be a number of degrees' }).min(0, 'must not be negative') }),
], { error: 'must be one of returnLoss, vswr, insertionLoss, isolation, coupling, amplitudeImbalance, phaseDifference' })

/** Guards a document's `spec` (contract 1.1): centre, optional band and the conditions to meet. */
export const specDocumentSchema = z.looseObject({
  center: paramValue,
  band: z.looseObject({ start: paramValue, stop: paramValue }).optional(),
  conditions: z.array(specConditionSchema).max(LIMITS.specConditions, `a spec may have at most ${LIMITS.specConditions} conditions`),
})

const valueKey = z.string().min(1, 'must not be empty').max(LIMITS.valueKeyLength, `a key may have at most ${LIMITS.valueKeyLength} characters`)

/** Guards `tunables` (contract 1.1): KEY → { min, max }. */
export const tunablesSchema = z.record(valueKey, z.looseObject({ min: paramValue, max: paramValue }))
  .refine(v => Object.keys(v).length <= LIMITS.tunables, `a network may have at most ${LIMITS.tunables} tunables`)

/** Guards `tolerances` (contract 1.1): KEY → { relative } or { absolute }, with an optional distribution. */
export const tolerancesSchema = z.record(valueKey, z.looseObject({
  relative: z.number({ error: 'must be a fraction such as 0.05' }).min(0, 'must not be negative').max(1, 'must be a fraction of at most 1').optional(),
  absolute: paramValue.optional(),
  distribution: z.enum(['uniform', 'normal'], { error: 'must be uniform or normal' }).optional(),
}).refine(t => (t.relative === undefined) !== (t.absolute === undefined), 'give either relative or absolute, not both or neither'))
  .refine(v => Object.keys(v).length <= LIMITS.tolerances, `a network may have at most ${LIMITS.tolerances} tolerances`)

/**
 * Structural schema of a network document, version 1 or 1.1. It guards the shape only;
 * units, names and topology are checked by the evaluator and the topology checker.
 * Unknown keys are accepted and kept, because the contract may be extended.
 */
export const networkDocumentSchema = z.looseObject(
  {
    format: z.literal('portwright.network'),
    version: z.union([z.literal(1), z.literal(1.1)], { error: 'version must be 1 or 1.1' }),
    name: z.string().max(LIMITS.nameLength, `a network name may have at most ${LIMITS.nameLength} characters`).optional(),
    referenceImpedance: paramValue.optional(),
    variables: z.record(z.string(), paramValue)
      .refine(v => Object.keys(v).length <= LIMITS.variables, `a network may have at most ${LIMITS.variables} variables`)
      .refine(v => Object.keys(v).every(k => k.length <= LIMITS.variableNameLength), `a variable name may have at most ${LIMITS.variableNameLength} characters`).optional(),
    sweep: sweepSchema.optional(),
    substrates: z.record(z.string(), substrateSchema)
      .refine(v => Object.keys(v).length <= LIMITS.substrates, `a network may have at most ${LIMITS.substrates} substrates`)
      .refine(v => Object.keys(v).every(k => k.length <= LIMITS.variableNameLength), `a substrate name may have at most ${LIMITS.variableNameLength} characters`).optional(),
    blocks: z.array(blockSpecSchema).max(LIMITS.blocks, `a network may have at most ${most(LIMITS.blocks)} blocks`),
    wires: z.array(wireSchema).max(LIMITS.wires, `a network may have at most ${most(LIMITS.wires)} wires`),
    spec: specDocumentSchema.optional(),
    tunables: tunablesSchema.optional(),
    tolerances: tolerancesSchema.optional(),
  },
  { error: (issue) => (issue.input === null || typeof issue.input !== 'object' ? 'a network document must be a JSON object' : undefined) },
)

/** Result of structural parsing: the typed document or the problems found. */
export type ParseResult = { ok: true; document: NetworkDocument } | { ok: false; problems: Problem[] }

function pathText(path: PropertyKey[]): string {
  let text = ''
  for (const part of path) {
    if (typeof part === 'number') text += `[${part}]`
    else text += text ? `.${String(part)}` : String(part)
  }
  return text
}

function blockIdAt(input: unknown, index: number): string | undefined {
  const blocks = (input as { blocks?: unknown })?.blocks
  if (!Array.isArray(blocks)) return undefined
  const id = (blocks[index] as { id?: unknown } | undefined)?.id
  return typeof id === 'string' && id ? id : undefined
}

/** Checks the structure of a document; every problem names the offending path and, where known, the block. */
export function parseNetworkDocument(input: unknown): ParseResult {
  const parsed = networkDocumentSchema.safeParse(input)
  if (parsed.success) return { ok: true, document: parsed.data as NetworkDocument }
  const problems: Problem[] = parsed.error.issues.map((issue) => {
    const path = pathText(issue.path)
    const problem: Problem = { message: path ? `${path}: ${issue.message}` : issue.message }
    if (issue.path[0] === 'blocks' && typeof issue.path[1] === 'number') {
      const id = blockIdAt(input, issue.path[1])
      if (id) {
        problem.block = id
        problem.message = `block ${id}, ${issue.path.slice(2).map(String).join('.') || 'definition'}: ${issue.message}`
      }
      if (issue.path[2] === 'params' && typeof issue.path[3] === 'string') problem.field = issue.path[3]
    } else if (path) {
      problem.field = path
    }
    return problem
  })
  return { ok: false, problems }
}
