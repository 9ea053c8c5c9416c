/** A project member as mentions see them. */
export interface MentionCandidate {
  id: string
  email: string
}

const MENTION = /(^|[^\w.@])@([A-Za-z0-9._%+-]+(?:@[A-Za-z0-9-]+(?:\.[A-Za-z0-9-]+)+)?)/g

/**
 * The members a comment mentions, by id, in order of first mention. A mention is "@" and
 * either a member's full e-mail address or the part before its "@" when no other member
 * shares that part ("@priya"). Anything else after "@" is left as plain text.
 */
export function findMentions(body: string, members: readonly MentionCandidate[]): string[] {
  const byEmail = new Map(members.map(m => [m.email.toLowerCase(), m.id]))
  const byLocal = new Map<string, string | null>()
  for (const m of members) {
    const local = m.email.toLowerCase().split('@')[0]!
    byLocal.set(local, byLocal.has(local) ? null : m.id)
  }
  const found: string[] = []
  for (const match of body.matchAll(MENTION)) {
    // A trailing full stop ends the sentence, not the name.
    const handle = match[2]!.toLowerCase().replace(/\.+$/, '')
    const id = handle.includes('@') ? byEmail.get(handle) : byLocal.get(handle)
    if (id && !found.includes(id)) found.push(id)
  }
  return found
}

/** The handle to type for a member: the short form when it is unambiguous, else the full address. */
export function mentionHandle(member: MentionCandidate, members: readonly MentionCandidate[]): string {
  const local = member.email.split('@')[0]!.toLowerCase()
  const shared = members.filter(m => m.email.split('@')[0]!.toLowerCase() === local).length > 1
  return `@${shared ? member.email : local}`
}

/** A mention that reached nobody: no member has that handle, or several share it. */
export interface UnmatchedMention {
  /** As typed, with its "@". */
  handle: string
  reason: 'nobody' | 'several'
}

/**
 * The mentions of a comment that matched no single member, once each in order of
 * appearance, so the author learns that nobody was told. Mentions are read exactly
 * as `findMentions` reads them.
 */
export function findUnmatchedMentions(body: string, members: readonly MentionCandidate[]): UnmatchedMention[] {
  const emails = new Set(members.map(m => m.email.toLowerCase()))
  const locals = new Map<string, number>()
  for (const m of members) {
    const local = m.email.toLowerCase().split('@')[0]!
    locals.set(local, (locals.get(local) ?? 0) + 1)
  }
  const out: UnmatchedMention[] = []
  const seen = new Set<string>()
  for (const match of body.matchAll(MENTION)) {
    const typed = match[2]!.replace(/\.+$/, '')
    const handle = typed.toLowerCase()
    if (!handle || seen.has(handle)) continue
    seen.add(handle)
    const count = handle.includes('@') ? (emails.has(handle) ? 1 : 0) : (locals.get(handle) ?? 0)
    if (count !== 1) out.push({ handle: `@${typed}`, reason: count === 0 ? 'nobody' : 'several' })
  }
  return out
}
