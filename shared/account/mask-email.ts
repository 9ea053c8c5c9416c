/**
 * An e-mail address with most of its mailbox name hidden ("n•••r@quillmere.example"), for messages shown to someone
 * who may not own it: enough for the owner to recognise which address is meant, not enough to copy it.
 */
export function maskEmail(address: string): string {
  const at = address.lastIndexOf('@')
  if (at <= 0) return '•••'
  const local = address.slice(0, at)
  const domain = address.slice(at + 1)
  const shown = local.length >= 4 ? `${local[0]}•••${local[local.length - 1]}` : `${local[0]}•••`
  return `${shown}@${domain}`
}
