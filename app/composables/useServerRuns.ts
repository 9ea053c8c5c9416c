import { computed, onBeforeUnmount, ref } from 'vue'
import type { JobDto } from '~~/shared/types/jobs'
import type { SubmitJobBody } from '~~/shared/schemas/jobs'

/**
 * A network's long runs on the server's queue: send one, follow its progress, cancel one. Progress is pushed by
 * the server (server-sent events, `…/jobs/events`) as workers report it; only while that stream is down is the
 * list read every second (while any run is waiting or running). The list is the server's, so every member sees
 * the same runs.
 */
export function useServerRuns(projectId: string, networkId: string) {
  const base = `/api/projects/${projectId}/networks/${networkId}/jobs`
  const runs = ref<JobDto[]>([])
  const error = ref('')
  const sending = ref(false)
  let timer: ReturnType<typeof setTimeout> | undefined
  let stopped = false
  /** True while the server's event stream is open: no polling then. */
  const pushed = ref(false)
  let source: EventSource | undefined
  let reopen: ReturnType<typeof setTimeout> | undefined

  const unfinished = computed(() => runs.value.some(r => r.state === 'queued' || r.state === 'running'))

  const messageOf = (e: unknown) => (e as { data?: { message?: string } }).data?.message ?? 'The server could not be reached; try again.'

  async function refresh(): Promise<void> {
    follow()
    try {
      runs.value = await $fetch<JobDto[]>(base)
      error.value = ''
    } catch (e) {
      error.value = messageOf(e)
    }
    schedule()
  }

  function schedule(): void {
    clearTimeout(timer)
    if (!stopped && unfinished.value && !pushed.value) timer = setTimeout(refresh, 1000)
  }

  /** One run as the server pushed it: replaces the listed one, or comes first when new. */
  function merge(job: JobDto): void {
    runs.value = runs.value.some(r => r.id === job.id) ? runs.value.map(r => (r.id === job.id ? job : r)) : [job, ...runs.value]
  }

  /** Opens the server's event stream; the browser reopens it after a drop, and polling covers the gap. */
  function follow(): void {
    if (stopped || source || typeof EventSource === 'undefined') return
    const opened = new EventSource(`${base}/events`)
    source = opened
    opened.addEventListener('runs', (e) => {
      runs.value = JSON.parse((e as MessageEvent<string>).data) as JobDto[]
      error.value = ''
      pushed.value = true
      clearTimeout(timer)
    })
    opened.addEventListener('run', (e) => { merge(JSON.parse((e as MessageEvent<string>).data) as JobDto) })
    opened.onerror = () => {
      pushed.value = false
      schedule()
      if (opened.readyState === EventSource.CLOSED) {
        // Refused (signed out, removed) or the server is gone: poll, and try the stream again later.
        source = undefined
        clearTimeout(reopen)
        if (!stopped) reopen = setTimeout(follow, 15_000)
      }
    }
  }

  async function send(body: SubmitJobBody): Promise<void> {
    sending.value = true
    try {
      const job = await $fetch<JobDto>(base, { method: 'POST', body })
      runs.value = [job, ...runs.value]
      error.value = ''
      schedule()
    } catch (e) {
      error.value = messageOf(e)
    } finally {
      sending.value = false
    }
  }

  async function cancel(jobId: string): Promise<void> {
    try {
      const job = await $fetch<JobDto>(`${base}/${jobId}/cancel`, { method: 'POST', body: {} })
      runs.value = runs.value.map(r => (r.id === job.id ? job : r))
    } catch (e) {
      error.value = messageOf(e)
    }
  }

  onBeforeUnmount(() => {
    stopped = true
    clearTimeout(timer)
    clearTimeout(reopen)
    source?.close()
  })
  return { runs, error, sending, unfinished, pushed, refresh, send, cancel }
}
