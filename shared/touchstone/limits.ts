/** Sizes checked before a Touchstone file is read any further: what one engineer's measured part may need, no more. */
export const TOUCHSTONE_LIMITS = {
  /** Characters of text (a file of plain ASCII: bytes). */
  characters: 64 * 1024 * 1024,
  ports: 64,
  frequencies: 100_001,
  noiseFrequencies: 100_001,
  /** Characters on one line; a longer line is not a Touchstone line. */
  lineCharacters: 65_536,
  /** Bytes of one file uploaded to a project (stated beside the upload button). */
  uploadBytes: 8 * 1024 * 1024,
} as const
