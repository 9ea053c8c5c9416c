import type { z } from 'zod'
import { readServerErrors, type ServerErrors } from '~/utils/server-errors'

/**
 * A form's submit: checks the fields with the same zod schema the server uses, then sends,
 * and keeps the errors (ours or the server's) ready to show next to each field.
 */
export function useFormSubmit<S extends z.ZodType>(schema: S, form: object, send: (data: z.infer<S>) => Promise<unknown>) {
  const errors = ref<ServerErrors>({ message: '', fields: {} })
  const busy = ref(false)

  async function submit() {
    const checked = schema.safeParse(form)
    if (!checked.success) {
      errors.value = { message: '', fields: Object.fromEntries(checked.error.issues.map(i => [String(i.path[0]), i.message])) }
      return
    }
    busy.value = true
    try {
      errors.value = { message: '', fields: {} }
      await send(checked.data)
    } catch (error) {
      errors.value = readServerErrors(error)
    } finally {
      busy.value = false
    }
  }

  return { errors, busy, submit }
}
