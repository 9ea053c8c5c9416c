/**
 * Drafts: entries that do not evaluate yet. A draft stays in its field with its
 * message while the shared document keeps the last good value; it is never
 * written to the document, the server or the live session. Drafts are kept per
 * tab in sessionStorage (keyed by network and field), so a reload shows them
 * again, and they are checked again whenever the document changes (a variable
 * a draft names may have been defined meanwhile).
 */
import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { ParamValue } from '~~/shared/network/types'
import { useEditorStore } from './editor'
import { checkEntry, entryExists, entryKey, entryTarget, type EntryTarget } from '~~/app/utils/editor/entryCheck'

export interface Draft { text: string, message: string }

const PREFIX = 'portwright:draft:'

function storage(): Storage | null {
  try {
    return typeof sessionStorage === 'undefined' ? null : sessionStorage
  }
  catch {
    return null
  }
}

export const useDraftsStore = defineStore('drafts', () => {
  const editor = useEditorStore()
  /** The network the drafts belong to ('' in tests and templates: nothing is kept). */
  const scope = ref('')
  const drafts = ref<Record<string, Draft>>({})

  function storageKey(key: string): string {
    return `${PREFIX}${scope.value}:${key}`
  }
  function persist(key: string, draft: Draft | null) {
    const s = storage()
    if (!s || !scope.value) return
    try {
      if (draft) s.setItem(storageKey(key), draft.text)
      else s.removeItem(storageKey(key))
    }
    catch { /* storage full or refused: the draft still lives in this page */ }
  }

  /** Start on a network: take back the drafts this tab kept for it, checked against its document. */
  function open(networkId: string) {
    scope.value = networkId
    drafts.value = {}
    const s = storage()
    if (!s || !networkId) return
    const prefix = `${PREFIX}${networkId}:`
    for (let i = 0; i < s.length; i++) {
      const full = s.key(i)
      if (!full?.startsWith(prefix)) continue
      const key = full.slice(prefix.length)
      if (entryTarget(key)) drafts.value[key] = { text: s.getItem(full) ?? '', message: '' }
    }
    // Messages only: the live document is not attached yet, and a write now would be replaced by it.
    recheck({ write: false })
  }

  function draftOf(target: EntryTarget): Draft | undefined {
    return drafts.value[entryKey(target)]
  }

  function write(target: EntryTarget, value: ParamValue | undefined) {
    if (target.kind === 'param') editor.setParam(target.block, target.param, value)
    else if (value === undefined) return
    else if (target.kind === 'variable') editor.setVariable(target.name, value)
    else if (target.kind === 'sweep') editor.setSweep({ [target.field]: value })
    else editor.setReferenceImpedance(value)
  }

  function drop(key: string) {
    if (!(key in drafts.value)) return
    const next = { ...drafts.value }
    delete next[key]
    drafts.value = next
    persist(key, null)
  }

  /**
   * What was typed into a field: written to the document when it evaluates (and
   * differs from what is there), otherwise kept as a draft with its message.
   */
  function enter(target: EntryTarget, text: string): boolean {
    if (editor.readOnly) return false
    const key = entryKey(target)
    const outcome = checkEntry(editor.doc, target, text)
    if (outcome.ok) {
      drop(key)
      write(target, outcome.value)
      return true
    }
    drafts.value = { ...drafts.value, [key]: { text, message: outcome.message } }
    persist(key, drafts.value[key]!)
    return false
  }

  /** Forget a field's draft: the field shows the document's value again. */
  function discard(target: EntryTarget) {
    drop(entryKey(target))
  }

  /** A block was renamed: its drafts follow it. */
  function renameBlock(from: string, to: string) {
    for (const [key, draft] of Object.entries(drafts.value)) {
      const target = entryTarget(key)
      if (target?.kind !== 'param' || target.block !== from) continue
      const next = entryKey({ ...target, block: to })
      drop(key)
      drafts.value = { ...drafts.value, [next]: draft }
      persist(next, draft)
    }
  }

  /** Check every draft against the document as it is now; those that evaluate are written (unless `write` is false). */
  function recheck(options: { write?: boolean } = {}) {
    const writing = options.write !== false
    if (editor.readOnly && writing) return
    for (const [key, draft] of Object.entries(drafts.value)) {
      const target = entryTarget(key)
      if (!target || !entryExists(editor.doc, target)) {
        if (writing) drop(key)
        continue
      }
      const outcome = checkEntry(editor.doc, target, draft.text)
      if (outcome.ok && writing) {
        drop(key)
        write(target, outcome.value)
      }
      else if (!outcome.ok && outcome.message !== draft.message) drafts.value = { ...drafts.value, [key]: { ...draft, message: outcome.message } }
    }
  }

  return { scope, drafts, open, draftOf, enter, discard, recheck, renameBlock }
})
