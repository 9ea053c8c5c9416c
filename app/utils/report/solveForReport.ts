/** The report's solve: the document over its own sweep with the shared solver, as the editor's worker would. */
import { solveDocument, type PrepareOptions } from '~~/shared/solver'
import type { Evaluated, NetworkDocument, Problem } from '~~/shared/network/types'
import type { SolvedData } from '~~/app/workers/protocol'

/** The result (null when the network does not solve), the problems and warnings, and the evaluated values. */
export interface ReportSolve {
  result: SolvedData | null
  problems: Problem[]
  evaluated: Evaluated | null
}

/** File names the document's data blocks read (to load before solving). */
export function dataFileNames(doc: NetworkDocument): string[] {
  const names = new Set<string>()
  for (const block of doc.blocks ?? []) {
    const file = (block.params as Record<string, unknown> | undefined)?.file
    if (block.type === 'data' && typeof file === 'string') names.add(file)
  }
  return [...names]
}

/** Solves a document for the report (`options.resolveData` gives data blocks their files); never throws. */
export function solveForReport(doc: NetworkDocument, options: PrepareOptions = {}): ReportSolve {
  try {
    const solved = solveDocument(doc, options)
    if (!solved.ok) return { result: null, problems: solved.problems, evaluated: solved.evaluated ?? null }
    const r = solved.result
    return {
      result: { ports: r.ports, impedances: [...r.impedances], frequencies: r.frequencies, re: r.re, im: r.im },
      problems: [],
      evaluated: solved.evaluated ?? null,
    }
  } catch (error) {
    return { result: null, problems: [{ message: `The solver failed: ${error instanceof Error ? error.message : String(error)}` }], evaluated: null }
  }
}
