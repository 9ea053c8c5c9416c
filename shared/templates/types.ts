import type { NetworkDocument } from '../network/types'

/** What one port of a template is for, in a few words. */
export interface TemplatePort {
  index: number
  role: string
}

/** The array a beamforming template feeds: its inputs, outputs in element order and spacing. */
export interface TemplateArray {
  inputs: number[]
  outputs: number[]
  /** Element spacing in wavelengths at the spec's centre. */
  spacing: number
}

/** A ready-made network a project can start from. */
export interface NetworkTemplate {
  /** Stable identifier (kebab-case). */
  slug: string
  name: string
  /** One line saying what it is and does. */
  description: string
  tags: string[]
  ports: TemplatePort[]
  array?: TemplateArray
  /** A fresh version-1.1 document with spec, block layout and, where useful, tunables and tolerances. */
  build(): NetworkDocument
}
