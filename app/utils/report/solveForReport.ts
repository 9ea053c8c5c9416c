/** The report's solve: the document over its own sweep with the shared solver, as the editor's worker would. */
import { solveDocument } from '~~/shared/solver'
import type { Evaluated, NetworkDocument, Problem } from '~~/shared/network/types'
import type { SolvedData } from '~~/app/workers/protocol'

/** The result (null when the network does not solve), the problems and warnings, and the evaluated values. */
export interface ReportSolve {
  result: SolvedData | null
  problems: Problem[]
  evaluated: Evaluated | null
}

/** Solves a document for the report; never throws. */
export function solveForReport(doc: NetworkDocument): ReportSolve {
  try {
    const solved = solveDocument(doc)
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
