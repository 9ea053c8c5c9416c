/**
 * `$fetch` without typed routes: Nitro's route-type inference recurses too deep on these
 * nested dynamic URLs (see ProjectMembers.vue), so review calls state their answer type.
 */
export const reviewApi = $fetch as <T = unknown>(url: string, options?: { method?: 'GET' | 'POST' | 'PATCH' | 'DELETE'; body?: unknown; query?: Record<string, string> }) => Promise<T>

/** The review pages' URLs, in one place. */
export const reviewPaths = {
  snapshots: (projectId: string, networkId: string) => `/projects/${projectId}/snapshots/${networkId}`,
  snapshot: (projectId: string, networkId: string, snapshotId: string) => `/projects/${projectId}/snapshots/${networkId}/${snapshotId}`,
  compare: (projectId: string, networkId: string, before: string, after: string) =>
    `/projects/${projectId}/snapshots/${networkId}/compare?before=${before}&after=${after}`,
  network: (projectId: string, networkId: string) => `/projects/${projectId}/networks/${networkId}`,
}

/** Date and time as engineers in any locale read them unambiguously: 2026-12-01 14:05. */
export function formatWhen(iso: string): string {
  const d = new Date(iso)
  const pad = (n: number) => String(n).padStart(2, '0')
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())} ${pad(d.getHours())}:${pad(d.getMinutes())}`
}
