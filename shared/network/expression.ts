import type { EvalFunction, MathNode, Unit } from 'mathjs'
import { MAX_EXPRESSION_LENGTH, refuseConstruct } from './expression-allow-list'
import { formatQuantity } from './format-quantity'
import { valueMath as math } from './math-instance'
import { DIMENSION_NAMES, QUANTITIES, type QuantityKind } from './quantities'
import type { ParamValue } from './types'

const parse = math.parse.bind(math)
const isValuelessUnit = (name: string): boolean => math.Unit.isValuelessUnit(name)
const isFunctionName = (name: string): boolean =>
  !isValuelessUnit(name) && typeof (math as unknown as Record<string, unknown>)[name] === 'function'

/** Values expressions can refer to: evaluated variables, each a number (SI) or a mathjs unit. */
export type Scope = Map<string, number | Unit>

/** A parsed expression and the names it refers to (function names excluded). */
export type ParsedExpression = { ok: true; node: MathNode; names: string[] } | { ok: false; error: string }

function normalise(text: string): string {
  // Engineers type Ω and µ; mathjs spells them ohm and u.
  return text.replace(/Ω/g, 'ohm').replace(/[µμ]/g, 'u').trim()
}

/**
 * Parsed expressions by their text, at most PARSED_KEPT of them, oldest dropped first. Parsing and
 * checking is most of an evaluation's cost, and the same texts come back at every edit, solve and
 * tolerance trial. Entries are shared: nobody may change what parseExpression returns.
 */
const PARSED_KEPT = 4096
const parsedByText = new Map<string, ParsedExpression>()

/** Parses an expression string and lists the names it uses, so variable dependencies can be ordered. */
export function parseExpression(text: string): ParsedExpression {
  // Texts too long to be read are refused at once, and never kept.
  if (text.length > MAX_EXPRESSION_LENGTH) return parseFresh(text)
  const kept = parsedByText.get(text)
  if (kept) return kept
  const parsed = parseFresh(text)
  parsedByText.set(text, parsed)
  if (parsedByText.size > PARSED_KEPT) parsedByText.delete(parsedByText.keys().next().value!)
  return parsed
}

// Compiled once per parsed node: mathjs's node.evaluate compiles afresh at every call.
const compiledByNode = new WeakMap<MathNode, EvalFunction>()
function evaluateNode(node: MathNode, scope: Scope): unknown {
  let compiled = compiledByNode.get(node)
  if (!compiled) {
    compiled = node.compile()
    compiledByNode.set(node, compiled)
  }
  return compiled.evaluate(scope)
}

function parseFresh(text: string): ParsedExpression {
  const source = normalise(text)
  if (!source) return { ok: false, error: 'is empty' }
  if (source.length > MAX_EXPRESSION_LENGTH) return { ok: false, error: `is too long (${MAX_EXPRESSION_LENGTH} characters at most)` }
  let node: MathNode
  try {
    node = parse(source)
  } catch (error) {
    return { ok: false, error: `cannot be read as an expression (${(error as Error).message})` }
  }
  // Documents come from other people: only allow-listed constructs are ever evaluated.
  const refusal = refuseConstruct(node, isFunctionName)
  if (refusal) return { ok: false, error: refusal }
  const names = new Set<string>()
  node.traverse((child, path, parent) => {
    if (child.type !== 'SymbolNode') return
    if (parent?.type === 'FunctionNode' && path === 'fn') return
    names.add((child as unknown as { name: string }).name)
  })
  return { ok: true, node, names: [...names] }
}

/** True when a name is a known unit, constant or function rather than a user variable. */
export function isBuiltInName(name: string): boolean {
  return isValuelessUnit(name) || (math as unknown as Record<string, unknown>)[name] !== undefined
}

function describeUnit(unit: Unit): string {
  for (const [name, label] of DIMENSION_NAMES) {
    if (unit.equalBase(math.unit(1, name))) return label
  }
  return `a quantity in ${unit.formatUnits()}`
}

/** Outcome of evaluating one value as a quantity of a known kind, in SI units. */
export type QuantityOutcome = { ok: true; value: number } | { ok: false; error: string }

function fromRaw(raw: unknown, kind: QuantityKind, shown: string): QuantityOutcome {
  const info = QUANTITIES[kind]
  if (typeof raw === 'number') {
    return Number.isFinite(raw) ? { ok: true, value: raw } : { ok: false, error: `${shown} is not a finite number` }
  }
  if (math.isUnit(raw)) {
    const unit = raw as Unit
    if (info.unit === null) return { ok: false, error: `${shown} is ${describeUnit(unit)}, but ${info.label} is expected` }
    if (!unit.equalBase(math.unit(1, info.unit))) {
      return { ok: false, error: `${shown} is ${describeUnit(unit)}, but ${info.label} (${info.symbol}) is expected` }
    }
    const value = unit.toNumber(info.unit)
    return Number.isFinite(value) ? { ok: true, value } : { ok: false, error: `${shown} is not a finite number` }
  }
  if (math.isComplex(raw)) return { ok: false, error: `${shown} is a complex number; a real value is expected` }
  return { ok: false, error: `${shown} does not give a number` }
}

/**
 * Evaluates a parameter (number in SI or expression string) as a quantity of the given kind.
 * Plain numbers are SI; unit-bearing results must have the kind's dimension.
 */
export function evaluateQuantity(input: ParamValue, kind: QuantityKind, scope: Scope, failed?: ReadonlySet<string>): QuantityOutcome {
  if (typeof input === 'number') return fromRaw(input, kind, String(input))
  let text = input
  // "3 dB" is natural to type; decibels are plain numbers here.
  if (kind === 'decibel') text = text.replace(/\s*dB\s*$/i, '')
  const parsed = parseExpression(text)
  if (!parsed.ok) return { ok: false, error: `"${input}" ${parsed.error}` }
  for (const name of parsed.names) {
    if (failed?.has(name)) return { ok: false, error: `"${input}" uses the variable ${name}, which has an error` }
    if (!scope.has(name) && !isBuiltInName(name)) return { ok: false, error: `"${input}" uses the unknown name ${name}` }
  }
  let raw: unknown
  try {
    raw = evaluateNode(parsed.node, scope)
  } catch (error) {
    return { ok: false, error: `"${input}" cannot be evaluated (${(error as Error).message})` }
  }
  return fromRaw(raw, kind, `"${input}"`)
}

/** Evaluates a variable's value without a required kind: a number or a unit-bearing quantity. */
export function evaluateVariableValue(input: ParamValue, scope: Scope): { ok: true; value: number | Unit } | { ok: false; error: string } {
  if (typeof input === 'number') return Number.isFinite(input) ? { ok: true, value: input } : { ok: false, error: 'is not a finite number' }
  const parsed = parseExpression(input)
  if (!parsed.ok) return { ok: false, error: `"${input}" ${parsed.error}` }
  let raw: unknown
  try {
    raw = evaluateNode(parsed.node, scope)
  } catch (error) {
    return { ok: false, error: `"${input}" cannot be evaluated (${(error as Error).message})` }
  }
  if (typeof raw === 'number') return Number.isFinite(raw) ? { ok: true, value: raw } : { ok: false, error: `"${input}" is not a finite number` }
  if (math.isUnit(raw)) return { ok: true, value: raw as Unit }
  if (math.isComplex(raw)) return { ok: false, error: `"${input}" is a complex number; a real value is expected` }
  return { ok: false, error: `"${input}" does not give a number` }
}

const VARIABLE_KINDS: ReadonlyArray<readonly [string, QuantityKind]> = [
  ['Hz', 'frequency'], ['ohm', 'impedance'], ['m', 'length'], ['F', 'capacitance'], ['H', 'inductance'], ['deg', 'angle'],
]

/** SI value, unit and display text of an evaluated variable, e.g. 35.36 Ω. */
export function describeVariable(value: number | Unit): { value: number; unit?: string; display: string } {
  if (typeof value === 'number') return { value, display: String(Number(value.toPrecision(4))) }
  for (const [unit, kind] of VARIABLE_KINDS) {
    if (value.equalBase(math.unit(1, unit))) {
      const si = value.toNumber(unit)
      return { value: si, unit: QUANTITIES[kind].symbol, display: formatQuantity(si, kind) }
    }
  }
  const si = value.toSI()
  return { value: si.toNumber(si.formatUnits()), unit: si.formatUnits(), display: math.format(value, { precision: 4 }) }
}
