/**
 * Size limits of a network document, enforced wherever a document is written or solved (REST saves, live
 * updates, imports, the solver). They are far above any real feed network and keep one person's document from
 * costing the server what every team shares. The README's "Document limits" table states them.
 */
export const DOCUMENT_LIMITS = {
  /** Blocks in one document. */
  blocks: 2_000,
  /** Wires in one document. */
  wires: 4_000,
  /** Variables in one document. */
  variables: 200,
  /** Characters of a block id. */
  blockIdLength: 40,
  /** Characters of a variable name. */
  variableNameLength: 40,
  /** Characters of the network's name. */
  nameLength: 200,
  /** Characters of a terminal reference in a wire ("BLOCK.N"). */
  terminalLength: 48,
  /** Points of a document's own sweep (the command line may ask for more with --points). */
  sweepPoints: 20_001,
  /** Parameters of one block. */
  paramsPerBlock: 40,
  /** Named substrates. */
  substrates: 50,
  /** Nesting of subnetworks inside subnetworks. */
  subnetworkDepth: 8,
  /** Blocks of a network with every subnetwork use expanded (each use counts its blocks again). */
  expandedBlocks: 20_000,
  /** Conditions of a document's spec. */
  specConditions: 100,
  /** Entries of `tunables`, and of `tolerances`. */
  tunables: 200,
  tolerances: 500,
  /** Characters of a tunable or tolerance key (`BLOCK.param` or a variable name). */
  valueKeyLength: 82,
} as const
