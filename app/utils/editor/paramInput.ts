import type { ParamValue } from './blockCatalog'

const plainNumber = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i

/** Read what was typed in a parameter field: a plain number stays a number, anything else is an expression; blank is "not set". */
export function readParamInput(text: string): ParamValue | undefined {
  const t = text.trim()
  if (t === '') return undefined
  return plainNumber.test(t) ? Number(t) : t
}

/** Show a stored parameter in its field. */
export function showParam(value: ParamValue | undefined): string {
  return value === undefined ? '' : String(value)
}
