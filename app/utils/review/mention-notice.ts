import type { UnmatchedMention } from '~~/shared/review/mentions'

/** The comment form's words for mentions that reached nobody; empty when every mention matched one member. */
export function mentionNotice(unmatched: readonly UnmatchedMention[] | undefined): string {
  if (!unmatched?.length) return ''
  const nobody = unmatched.filter(m => m.reason === 'nobody').map(m => m.handle)
  const several = unmatched.filter(m => m.reason === 'several').map(m => m.handle)
  const parts: string[] = []
  if (nobody.length) parts.push(`${nobody.join(', ')} ${nobody.length === 1 ? 'is not a member' : 'are not members'} of this project, so nobody was told`)
  if (several.length) parts.push(`${several.join(', ')} ${several.length === 1 ? 'fits' : 'fit'} more than one member; mention them by full e-mail address`)
  return `Posted, but ${parts.join('; ')}.`
}
