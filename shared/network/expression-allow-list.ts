import type { MathNode } from 'mathjs'

/** Scalar functions a value may call: what an RF engineer writes in a value, and nothing that reaches beyond it. */
export const ALLOWED_FUNCTIONS: ReadonlySet<string> = new Set([
  'sqrt', 'cbrt', 'exp', 'log', 'ln', 'log10', 'log2', 'pow', 'abs', 'sign', 'min', 'max', 'round', 'floor', 'ceil', 'hypot',
  'sin', 'cos', 'tan', 'asin', 'acos', 'atan', 'atan2', 'sinh', 'cosh', 'tanh',
  'fromDbPower', 'fromDbAmplitude', 'toDbPower', 'toDbAmplitude',
])

/** Named constants a value may use besides its document's variables and units. */
export const ALLOWED_CONSTANTS: ReadonlySet<string> = new Set(['pi', 'e'])

const OPERATORS = new Set(['add', 'subtract', 'multiply', 'divide', 'pow', 'unaryMinus', 'unaryPlus', 'mod', 'smaller', 'larger', 'smallerEq', 'largerEq', 'equal', 'unequal'])

/** Longest expression accepted, in characters. */
export const MAX_EXPRESSION_LENGTH = 500
/** Most syntax-tree nodes in one expression. */
export const MAX_EXPRESSION_NODES = 200

// Words for constructs that are not allowed, as the person typing them would call them.
const CONSTRUCT_WORDS: Record<string, string> = {
  ArrayNode: 'a matrix or list',
  RangeNode: 'a range',
  IndexNode: 'indexing',
  AccessorNode: 'indexing or a property',
  ObjectNode: 'an object',
  AssignmentNode: 'an assignment',
  FunctionAssignmentNode: 'a function definition',
  BlockNode: 'several statements',
  ConditionalNode: 'a condition (?:)',
}

type Node = MathNode & { name?: string; op?: string; fn?: MathNode & { name?: string }; value?: unknown; args?: MathNode[] }

/**
 * Checks a parsed expression against the allow-list: numbers, names, arithmetic and comparison operators,
 * parentheses and the scalar functions above. Returns why it is refused, or null when it is allowed.
 * `isName` says whether a bare name is a unit or a variable (anything else is refused later as unknown).
 */
export function refuseConstruct(root: MathNode, isFunctionName: (name: string) => boolean): string | null {
  let count = 0
  let refusal: string | null = null
  root.traverse((raw, path, parent) => {
    if (refusal) return
    const node = raw as Node
    if (++count > MAX_EXPRESSION_NODES) {
      refusal = `is too complex (more than ${MAX_EXPRESSION_NODES} terms)`
      return
    }
    switch (node.type) {
      case 'ConstantNode':
        if (typeof node.value !== 'number') refusal = typeof node.value === 'string' ? 'uses text in quotes, which is not allowed in a value' : `uses the constant ${String(node.value)}, which is not allowed in a value`
        return
      case 'ParenthesisNode':
      case 'RelationalNode':
        return
      case 'OperatorNode':
        if (!OPERATORS.has(String(node.fn))) refusal = `uses the operator ${node.op}, which is not allowed in a value`
        return
      case 'SymbolNode': {
        const name = String(node.name)
        const calledHere = parent?.type === 'FunctionNode' && path === 'fn'
        if (calledHere) return
        if (ALLOWED_CONSTANTS.has(name)) return
        if (isFunctionName(name)) refusal = `uses the name ${name}, which is a function; call it with brackets, e.g. ${name}(x)`
        return
      }
      case 'FunctionNode': {
        const name = node.fn?.type === 'SymbolNode' ? String(node.fn.name) : null
        if (name === null) refusal = 'calls something that is not a function name'
        else if (!ALLOWED_FUNCTIONS.has(name)) refusal = `uses the function ${name}, which is not available (values may use ${[...ALLOWED_FUNCTIONS].join(', ')})`
        return
      }
      default:
        refusal = `uses ${CONSTRUCT_WORDS[node.type] ?? `a ${node.type.replace(/Node$/, '').toLowerCase()}`}, which is not allowed in a value`
    }
  })
  return refusal
}
