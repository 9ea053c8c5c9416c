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

/** A Touchstone file a template's `data` blocks name; it goes into the project with the network. */
export interface TemplateFile {
  /** File name in the project (`….sNp`), as the data blocks write it. */
  name: string
  /** The file's Touchstone text, generated afresh. */
  text(): string
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
  /** Data files the document's `data` blocks name; created in the project unless it has them. */
  files?: TemplateFile[]
  /** A fresh version-1.1 document with spec, block layout and, where useful, tunables and tolerances. */
  build(): NetworkDocument
}
