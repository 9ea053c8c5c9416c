/**
 * Listens for the editor's keys (see utils/editor/keymap.ts) and runs the
 * matching action. Keys typed into fields stay with the fields.
 */
import { onBeforeUnmount, onMounted } from 'vue'
import { bindingFor, type EditorAction } from '~~/app/utils/editor/keymap'

function typingIn(target: EventTarget | null): boolean {
  const el = target as HTMLElement | null
  if (!el) return false
  return el.isContentEditable || ['INPUT', 'SELECT', 'TEXTAREA'].includes(el.tagName)
}

export function useEditorKeys(run: Partial<Record<EditorAction, () => void>>, opts: { readOnly: () => boolean }) {
  function onKey(event: KeyboardEvent) {
    const binding = bindingFor(event)
    if (!binding) return
    if (typingIn(event.target) && binding.action !== 'escape' && binding.action !== 'save') return
    if (binding.edits && opts.readOnly() && binding.action !== 'save') return
    const action = run[binding.action]
    if (!action) return
    event.preventDefault()
    action()
  }
  onMounted(() => window.addEventListener('keydown', onKey))
  onBeforeUnmount(() => window.removeEventListener('keydown', onKey))
}
