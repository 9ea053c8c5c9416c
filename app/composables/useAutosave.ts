/**
 * Saves the editor's document through the network API, a short while after
 * each change, sending the revision it was based on. A 409 means someone saved
 * a newer version: saving stops and the user chooses (their version, or keep
 * a download of this one) — newer work is never overwritten silently.
 */
import { onBeforeUnmount, ref, watch } from 'vue'
import type { NetworkDto } from '~~/shared/types/api'
import { useEditorStore } from '~~/app/stores/editor'
import { downloadText, fileStem } from '~~/app/utils/editor/download'

export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'conflict' | 'invalid' | 'error' | 'readonly'

interface FetchError { statusCode?: number, data?: { data?: { revision?: number, problems?: Array<{ path?: string, message: string }> }, message?: string } }

export function useAutosave(projectId: string, networkId: string, initialRevision: number, options: { delayMs?: number, paused?: () => boolean } = {}) {
  const store = useEditorStore()
  const delay = options.delayMs ?? 800
  const status = ref<SaveStatus>(store.readOnly ? 'readonly' : 'saved')
  const revision = ref(initialRevision)
  const message = ref('')
  const problems = ref<string[]>([])
  const theirRevision = ref<number | null>(null)
  const savedAt = ref<Date | null>(null)
  let timer: ReturnType<typeof setTimeout> | undefined
  let inFlight = false
  let savedVersion = store.version
  const url = `/api/projects/${projectId}/networks/${networkId}`

  function schedule(ms = delay) {
    clearTimeout(timer)
    timer = setTimeout(save, ms)
  }

  async function save() {
    // Paused while live co-editing persists the document: two write paths would fight over revisions.
    if (options.paused?.()) return
    if (store.readOnly || status.value === 'conflict' || inFlight) return
    if (store.version === savedVersion) return
    inFlight = true
    status.value = 'saving'
    const version = store.version
    try {
      const dto = await $fetch<NetworkDto>(url, { method: 'PUT', body: { document: store.savedDocument(), revision: revision.value } })
      revision.value = dto.revision
      savedVersion = version
      savedAt.value = new Date()
      problems.value = []
      status.value = store.version === savedVersion ? 'saved' : 'unsaved'
      if (status.value === 'unsaved') schedule()
    }
    catch (error) {
      failed(error as FetchError)
    }
    finally {
      inFlight = false
    }
  }

  function failed(error: FetchError) {
    const data = error.data?.data
    if (error.statusCode === 409) {
      status.value = 'conflict'
      theirRevision.value = data?.revision ?? null
      message.value = error.data?.message ?? 'Someone saved a newer version.'
    }
    else if (error.statusCode === 422) {
      status.value = 'invalid'
      problems.value = (data?.problems ?? []).map(p => (p.path ? `${p.path}: ${p.message}` : p.message))
    }
    else {
      status.value = 'error'
      message.value = error.data?.message ?? 'The server could not be reached.'
      schedule(5000)
    }
  }

  /** Keep this version as a file, so nothing is lost whichever version wins. */
  function downloadMine() {
    downloadText(`${fileStem(store.doc.name)}-mine-rev${revision.value}.json`, `${JSON.stringify(store.savedDocument(), null, 2)}\n`)
  }

  /** Load the newer saved version in place of this one. */
  async function loadTheirs() {
    const dto = await $fetch<NetworkDto>(url)
    store.load(dto.document, { readOnly: store.readOnly })
    revision.value = dto.revision
    savedVersion = store.version
    theirRevision.value = null
    message.value = ''
    status.value = 'saved'
  }

  watch(() => store.version, () => {
    if (options.paused?.()) return
    if (store.readOnly || status.value === 'conflict') return
    if (store.version === savedVersion) return // a fresh load is what is saved already
    status.value = 'unsaved'
    schedule()
  })

  function beforeUnload(event: BeforeUnloadEvent) {
    if (status.value === 'unsaved' || status.value === 'saving' || status.value === 'conflict') event.preventDefault()
  }
  window.addEventListener('beforeunload', beforeUnload)
  onBeforeUnmount(() => {
    clearTimeout(timer)
    window.removeEventListener('beforeunload', beforeUnload)
  })

  return { status, revision, message, problems, theirRevision, savedAt, saveNow: () => { clearTimeout(timer); return save() }, downloadMine, loadTheirs }
}
