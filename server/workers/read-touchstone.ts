/**
 * Worker-thread entry that reads an uploaded or stored Touchstone file (bundled on its own into the built server,
 * see nuxt.config.ts). A file of several MiB takes a second or more to read: here it costs a pool thread with the
 * solve budget, not the event loop every team shares. A malformed file comes back as its line and reason.
 */
import { TouchstoneError } from '#shared/touchstone/error'
import { portsFromFileName, readTouchstone } from '#shared/touchstone/read'
import type { TouchstoneFile } from '#shared/touchstone/types'

/** The file's name (for the port count of its `.sNp` extension) and its text as stored (latin1). */
export interface ReadTouchstoneTask {
  name: string
  text: string
}

/** What the reader made of the file, or where and why it stopped. */
export type ReadTouchstoneOutcome = { ok: true; file: TouchstoneFile } | { ok: false; line: number; reason: string }

export default function read(task: ReadTouchstoneTask): ReadTouchstoneOutcome {
  try {
    return { ok: true, file: readTouchstone(task.text, { ports: portsFromFileName(task.name) }) }
  } catch (error) {
    if (error instanceof TouchstoneError) return { ok: false, line: error.line, reason: error.reason }
    throw error
  }
}
