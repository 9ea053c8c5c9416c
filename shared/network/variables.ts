import { describeVariable, evaluateVariableValue, isBuiltInName, parseExpression, type Scope } from './expression'
import type { EvaluatedValue, ParamValue, Problem } from './types'

/** Evaluated variables: the scope for expressions, what the inspector shows, and which ones failed. */
export interface VariablesOutcome {
  scope: Scope
  evaluated: Record<string, EvaluatedValue>
  failed: Set<string>
  problems: Problem[]
}

const NAME = /^[A-Za-z_][A-Za-z0-9_]*$/

/**
 * Evaluates the document's variables in dependency order. Variables may use each
 * other; a cycle, an unknown name or a bad value fails that variable and every
 * variable that uses it, each with a message naming the reason.
 */
export function evaluateVariables(variables: Record<string, ParamValue> | undefined): VariablesOutcome {
  const scope: Scope = new Map()
  const evaluated: Record<string, EvaluatedValue> = {}
  const failed = new Set<string>()
  const problems: Problem[] = []
  const entries = Object.entries(variables ?? {})
  const defined = new Set(entries.map(([name]) => name))
  const deps = new Map<string, string[]>()
  const errors = new Map<string, string>()

  for (const [name, input] of entries) {
    if (!NAME.test(name)) {
      errors.set(name, `"${name}" is not a valid variable name (letters, digits and _ only, not starting with a digit)`)
      continue
    }
    if (typeof input === 'number') {
      deps.set(name, [])
      continue
    }
    const parsed = parseExpression(input)
    if (!parsed.ok) {
      errors.set(name, `${parsed.error.startsWith('"') ? parsed.error : `"${input}" ${parsed.error}`}`)
      continue
    }
    const unknown = parsed.names.find(n => !defined.has(n) && !isBuiltInName(n))
    if (unknown) {
      errors.set(name, `"${input}" uses the unknown name ${unknown}`)
      continue
    }
    deps.set(name, parsed.names.filter(n => defined.has(n)))
  }

  // Depth-first walk; a grey node met again closes a cycle, reported with its full path.
  const state = new Map<string, 'visiting' | 'done'>()
  const visit = (name: string, trail: string[]): void => {
    if (state.get(name) === 'done') return
    if (state.get(name) === 'visiting') {
      const cycle = [...trail.slice(trail.indexOf(name)), name]
      for (const member of cycle.slice(0, -1)) {
        if (!errors.has(member)) errors.set(member, `is part of a cycle: ${cycle.join(' → ')}`)
      }
      return
    }
    state.set(name, 'visiting')
    for (const dep of deps.get(name) ?? []) visit(dep, [...trail, name])
    state.set(name, 'done')
    if (errors.has(name)) return
    const bad = (deps.get(name) ?? []).find(dep => errors.has(dep))
    if (bad) {
      errors.set(name, `uses the variable ${bad}, which has an error`)
      return
    }
    const outcome = evaluateVariableValue(variables![name]!, scope)
    if (!outcome.ok) {
      errors.set(name, outcome.error)
      return
    }
    scope.set(name, outcome.value)
    const shown = describeVariable(outcome.value)
    evaluated[name] = { value: shown.value, ...(shown.unit ? { unit: shown.unit } : {}), display: shown.display }
  }
  for (const name of deps.keys()) visit(name, [])

  for (const [name] of entries) {
    const error = errors.get(name)
    if (!error) continue
    failed.add(name)
    scope.delete(name)
    evaluated[name] = { error }
    problems.push({ field: `variables.${name}`, message: `variable ${name}: ${error}` })
  }
  return { scope, evaluated, failed, problems }
}
