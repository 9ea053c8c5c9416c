import type { StoredFileDataDto, StoredFileDto } from '~~/shared/types/api'
import type { DataSet } from '~~/shared/solver/types'

/**
 * Loads a project file's S-parameters by name for the editor's data blocks. The file list is fetched
 * once and again when a name is not in it (a file uploaded after the editor opened); undefined when
 * the project has no such file.
 */
export function projectDataLoader(projectId: string): (name: string) => Promise<DataSet | undefined> {
  let list: Promise<StoredFileDto[]> | null = null
  const fetchList = () => (list = $fetch<StoredFileDto[]>(`/api/projects/${projectId}/files`))
  return async (name) => {
    let file = (await (list ?? fetchList())).find(f => f.name === name)
    if (!file) file = (await fetchList()).find(f => f.name === name)
    if (!file) return undefined
    const data = await $fetch<StoredFileDataDto>(`/api/projects/${projectId}/files/${file.id}/data`)
    return { ports: data.ports, impedances: data.impedances, frequencies: Float64Array.from(data.frequencies), re: Float64Array.from(data.re), im: Float64Array.from(data.im) }
  }
}
