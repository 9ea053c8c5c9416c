import { computed, onBeforeUnmount, ref } from 'vue'
import type { JobDto } from '~~/shared/types/jobs'
import type { SubmitJobBody } from '~~/shared/schemas/jobs'

/**
 * A network's long runs on the server's queue: send one, follow its progress (polled every second while any run
 * is waiting or running), cancel one. The list is the server's, so every member sees the same runs.
 */
export function useServerRuns(projectId: string, networkId: string) {
  const base = `/api/projects/${projectId}/networks/${networkId}/jobs`
  const runs = ref<JobDto[]>([])
  const error = ref('')
  const sending = ref(false)
  let timer: ReturnType<typeof setTimeout> | undefined
  let stopped = false

  const unfinished = computed(() => runs.value.some(r => r.state === 'queued' || r.state === 'running'))

  const messageOf = (e: unknown) => (e as { data?: { message?: string } }).data?.message ?? 'The server could not be reached; try again.'

  async function refresh(): Promise<void> {
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
    if (!stopped && unfinished.value) timer = setTimeout(refresh, 1000)
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

  onBeforeUnmount(() => { stopped = true; clearTimeout(timer) })
  return { runs, error, sending, unfinished, refresh, send, cancel }
}
