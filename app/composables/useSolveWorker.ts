/**
 * Runs the solver in a Web Worker. At most one solve is in flight; edits that
 * arrive meanwhile collapse into one follow-up solve of the newest document,
 * and a reply for a document that has since changed is dropped. The last good
 * result stays on screen, marked stale, while the newest document has errors.
 */
import { onBeforeUnmount, ref, shallowRef, watch } from 'vue'
import type { Evaluated, NetworkDocument, Problem } from '~~/shared/network/types'
import type { SolveReply, SolvedData } from '~~/app/workers/protocol'
import type { DataSet } from '~~/shared/solver/types'
import { subnetworkRefs } from '~~/app/utils/editor/externalTerminals'
import { shareEvaluated } from '~~/app/utils/editor/shareEvaluated'

/** How long a solve runs before `slow` says so. */
const SLOW_AFTER_MS = 200

export interface SolveState {
  result: SolvedData | null
  /** The shown result is older than the document (it has errors, or a solve is running). */
  stale: boolean
  problems: Problem[]
  evaluated: Evaluated | null
  busy: boolean
  /** A solve has been busy for SLOW_AFTER_MS or more. */
  slow: boolean
  solveMs: number
  /** Increments whenever a new result is shown (plots redraw on it). */
  resultSeq: number
}

/** File names of the data blocks of these documents. */
function dataNames(documents: Iterable<NetworkDocument>): string[] {
  const names = new Set<string>()
  for (const document of documents) {
    for (const block of document.blocks ?? []) {
      const file = (block.params as Record<string, unknown> | undefined)?.file
      if (block.type === 'data' && typeof file === 'string') names.add(file)
    }
  }
  return [...names]
}

/** Where the worker gets the documents of sub-networks: loaded before a solve that needs them. */
export interface SubnetworkSource {
  /** Loads every document the given one uses as a sub-network, theirs in turn. */
  load(document: NetworkDocument): Promise<void>
  /** Loaded documents by reference (null: could not be loaded); a new map after a refresh. */
  documents(): ReadonlyMap<string, NetworkDocument | null>
  /** Forget what was loaded. */
  refresh(): void
}

export function useSolveWorker(options: { debounceMs?: number, loadData?: (name: string) => Promise<DataSet | undefined>, subnetworks?: SubnetworkSource } = {}) {
  const debounceMs = options.debounceMs ?? 0
  const result = shallowRef<SolvedData | null>(null)
  const stale = ref(false)
  const problems = shallowRef<Problem[]>([])
  const evaluated = shallowRef<Evaluated | null>(null)
  const busy = ref(false)
  // "Solving…" only for a solve long enough to notice: a slider's solves take milliseconds, and a flag that
  // flips twice per edit would re-render the workspace and the dock twice per edit for nothing.
  const slow = ref(false)
  let slowTimer: ReturnType<typeof setTimeout> | undefined
  watch(busy, (now) => {
    clearTimeout(slowTimer)
    if (!now) slow.value = false
    else if (!slow.value) slowTimer = setTimeout(() => { slow.value = true }, SLOW_AFTER_MS)
  })
  const solveMs = ref(0)
  const resultSeq = ref(0)
  let worker: Worker | null = null
  let latest = 0
  let inFlight = false
  let pending: NetworkDocument | null = null
  let timer: ReturnType<typeof setTimeout> | undefined
  // Data sets loaded for data blocks (null: not found, tried again on the next edit) and those the worker has.
  const loaded = new Map<string, DataSet | null>()
  const workerHas = new Set<string>()
  let loading = false
  // The sub-network documents the worker has: the map they came from and its size then.
  let sentNetworks: { map: ReadonlyMap<string, NetworkDocument | null>, size: number } | null = null
  let lastDocument: NetworkDocument | null = null

  function start(): Worker {
    workerHas.clear()
    sentNetworks = null
    const w = new Worker(new URL('../workers/solve.worker.ts', import.meta.url), { type: 'module' })
    w.onmessage = (event: MessageEvent<SolveReply>) => receive(event.data)
    w.onerror = (event) => {
      inFlight = false
      busy.value = false
      stale.value = true
      problems.value = [{ message: `The solver stopped: ${event.message || 'unknown error'}` }]
      worker?.terminate()
      worker = null
    }
    return w
  }

  function send() {
    if (!pending || inFlight || loading) return
    const inner = options.subnetworks
    if (inner && subnetworkRefs(pending).some(r => !inner.documents().has(r))) {
      // Sub-networks first (their data blocks need loading too), then everything else.
      loading = true
      busy.value = true
      inner.load(pending).catch(() => {}).finally(() => { loading = false; send() })
      return
    }
    const innerDocs = inner ? [...inner.documents().values()].filter((d): d is NetworkDocument => d !== null) : []
    const names = options.loadData ? dataNames([pending, ...innerDocs]) : []
    const missing = names.filter(name => !loaded.has(name))
    if (missing.length) {
      // Load first, then send the newest document; a failed load is reported by the solver as not found.
      loading = true
      busy.value = true
      Promise.all(missing.map(name => options.loadData!(name).then(data => loaded.set(name, data ?? null), () => loaded.set(name, null))))
        .finally(() => { loading = false; send() })
      return
    }
    worker ??= start()
    const document = pending
    pending = null
    inFlight = true
    busy.value = true
    const dataSets: Record<string, DataSet> = {}
    for (const name of names) {
      const data = loaded.get(name)
      if (data && !workerHas.has(name)) { dataSets[name] = data; workerHas.add(name) }
    }
    let networks: Record<string, NetworkDocument> | undefined
    const docs = inner?.documents()
    if (docs && (sentNetworks?.map !== docs || sentNetworks.size !== docs.size)) {
      networks = {}
      for (const [ref, doc] of docs) if (doc) networks[ref] = doc
      sentNetworks = { map: docs, size: docs.size }
    }
    worker.postMessage({ seq: ++latest, document, ...(Object.keys(dataSets).length ? { dataSets } : {}), ...(networks ? { networks } : {}) })
  }

  // Evaluated values and problems of the newest reply with a result, shown one task after its plot.
  let deferred: SolveReply | null = null

  function showDetails(reply: SolveReply) {
    // Unchanged values keep their objects, so only what an edit changed is drawn again.
    evaluated.value = shareEvaluated(evaluated.value, reply.evaluated)
    // An empty list for an empty list would only make everything that lists problems run again.
    if (reply.problems.length || problems.value.length) problems.value = reply.problems
  }

  function showDeferred() {
    const reply = deferred
    deferred = null
    if (reply) showDetails(reply)
  }

  function receive(reply: SolveReply) {
    inFlight = false
    if (pending) { send(); return } // a newer document is waiting: this reply is already stale
    busy.value = false
    if (reply.seq !== latest) return
    solveMs.value = reply.solveMs
    if (reply.result) {
      result.value = reply.result
      stale.value = false
      resultSeq.value++
      // The plot redraws first; the inspector and canvas labels (which re-render many elements) a task later.
      if (!deferred) setTimeout(showDeferred, 0)
      deferred = reply
    }
    else {
      deferred = null
      showDetails(reply)
      stale.value = result.value !== null
    }
  }

  /** Ask for a solve of this document. */
  function request(document: NetworkDocument) {
    for (const [name, data] of loaded) if (data === null) loaded.delete(name)
    pending = document
    lastDocument = document
    clearTimeout(timer)
    if (debounceMs > 0) timer = setTimeout(send, debounceMs)
    else send()
  }

  /** Read sub-networks and data files again (they may have been edited elsewhere) and solve once more. */
  function refresh() {
    options.subnetworks?.refresh()
    loaded.clear()
    workerHas.clear()
    if (lastDocument) request(lastDocument)
  }

  onBeforeUnmount(() => {
    clearTimeout(timer)
    clearTimeout(slowTimer)
    deferred = null
    worker?.terminate()
    worker = null
  })

  return { result, stale, problems, evaluated, busy, slow, solveMs, resultSeq, request, refresh }
}

/** The solver's state as panels read it: they are handed the whole object, so that each re-renders on what it shows. */
export type EditorSolve = ReturnType<typeof useSolveWorker>
