/** A board from the project's substrate library as a document substrate, under a name the document accepts. */
import type { NetworkDocument, Substrate } from '~~/shared/network/types'
import type { LibrarySubstrateDto } from '~~/shared/schemas/substrate-library'

/** A number without float noise: 0.000508 → "0.508" (in mm). */
const tidy = (value: number) => String(Number(value.toPrecision(10)))

/** Substrate keys written with units an engineer reads ("0.508 mm", "35 um"); absent when zero or lossless. */
export function librarySubstrateValues(board: LibrarySubstrateDto): Substrate {
  const out: Substrate = { permittivity: board.permittivity, height: `${tidy(board.height * 1e3)} mm` }
  if (board.thickness > 0) out.thickness = `${tidy(board.thickness * 1e6)} um`
  if (board.lossTangent > 0) out.lossTangent = board.lossTangent
  if (board.conductivity !== null) out.conductivity = board.conductivity
  if (board.roughness > 0) out.roughness = `${tidy(board.roughness * 1e6)} um`
  return out
}

/**
 * A document name for a library board: its name with anything but letters, digits, _ and -
 * turned into _, starting with a letter, at most 64 characters, and numbered when taken.
 */
export function librarySubstrateKey(doc: NetworkDocument, boardName: string): string {
  let base = boardName.replace(/[^A-Za-z0-9_-]+/g, '_').replace(/^_+|_+$/g, '').slice(0, 60)
  if (!/^[A-Za-z_]/.test(base)) base = `board_${base}`.slice(0, 60)
  const taken = new Set(Object.keys(doc.substrates ?? {}))
  if (!taken.has(base)) return base
  for (let i = 2; ; i++) if (!taken.has(`${base}_${i}`)) return `${base}_${i}`
}

/** Copies a library board into the document; returns the name it took. */
export function copyLibrarySubstrate(doc: NetworkDocument, board: LibrarySubstrateDto): string {
  const name = librarySubstrateKey(doc, board.name)
  doc.substrates = { ...(doc.substrates ?? {}), [name]: librarySubstrateValues(board) }
  return name
}
