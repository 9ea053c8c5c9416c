/**
 * The words of every e-mail Portwright sends, as pure functions of what they report:
 * each gives a subject, a plain-text body and an HTML body with the same content and a
 * link back into the app. Everything a user typed is escaped in the HTML.
 */
import type { ProjectRole } from '#shared/types/api'
import { reviewDecisionLabels, reviewStateLabels, type ReviewDecision, type ReviewState } from '#shared/types/review'
import { RF_SAFETY_CAUTION } from '#shared/review/summary-lines'

export interface MailContent {
  subject: string
  text: string
  html: string
}

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, c => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', '\'': '&#39;' })[c]!)
}

const quoteText = (text: string) => text.split('\n').map(line => `> ${line}`).join('\n')

/** The shared HTML frame: paper background, slate text, one copper button for the link. */
function frame(paragraphs: string[], link: { url: string; label: string }, footer: string[] = []): string {
  const body = paragraphs.join('\n')
  const foot = footer.map(f => `<p style="font-size:12px;color:#4a5560">${f}</p>`).join('\n')
  return `<!doctype html>
<html><body style="margin:0;background:#f7f5f0;font-family:Inter,Arial,sans-serif;color:#1f2a33">
<div style="max-width:560px;margin:0 auto;padding:24px">
<p style="font-weight:600;font-size:15px">Portwright</p>
${body}
<p><a href="${escapeHtml(link.url)}" style="display:inline-block;background:#b4643c;color:#ffffff;padding:8px 14px;border-radius:4px;text-decoration:none">${escapeHtml(link.label)}</a></p>
<p style="font-size:12px;color:#4a5560">Or paste this address into your browser: ${escapeHtml(link.url)}</p>
${foot}
</div></body></html>`
}

const p = (html: string) => `<p>${html}</p>`
const quoteHtml = (text: string) => `<blockquote style="margin:0;padding:8px 12px;border-left:3px solid #2f7f7a;background:#ffffff;white-space:pre-wrap">${escapeHtml(text)}</blockquote>`

export function invitationMail(input: {
  inviterName: string; projectName: string; role: ProjectRole; url: string; expiresAt: Date
}): MailContent {
  const until = input.expiresAt.toUTCString()
  const subject = `Join “${input.projectName}” on Portwright`
  const text = [
    `${input.inviterName} would like you to join the project “${input.projectName}” on Portwright as ${input.role}.`,
    '',
    `Join with this link (it works once, until ${until}):`,
    input.url,
    '',
    'You can create an account or sign in on the page it opens. If you did not expect this, ignore this message and nothing happens.',
  ].join('\n')
  const html = frame([
    p(`${escapeHtml(input.inviterName)} would like you to join the project <strong>“${escapeHtml(input.projectName)}”</strong> on Portwright as <strong>${input.role}</strong>.`),
    p(`The link works once, until ${escapeHtml(until)}. You can create an account or sign in on the page it opens.`),
  ], { url: input.url, label: 'Join the project' }, ['If you did not expect this, ignore this message and nothing happens.'])
  return { subject, text, html }
}

export function reviewRequestedMail(input: {
  requesterName: string; projectName: string; networkName: string; snapshotTitle: string
  message: string; summary: string[]; url: string
}): MailContent {
  const subject = `Your review, please: “${input.snapshotTitle}” (${input.projectName})`
  const text = [
    `${input.requesterName} froze “${input.snapshotTitle}” of the network “${input.networkName}” and asks you to look it over and decide whether it goes on.`,
    ...(input.message ? ['', quoteText(input.message)] : []),
    '',
    'What the snapshot shows:',
    ...input.summary.map(line => `  ${line}`),
    '',
    `Open the snapshot: ${input.url}`,
    '',
    RF_SAFETY_CAUTION,
  ].join('\n')
  const html = frame([
    p(`${escapeHtml(input.requesterName)} froze <strong>“${escapeHtml(input.snapshotTitle)}”</strong> of the network “${escapeHtml(input.networkName)}” and asks you to look it over and decide whether it goes on.`),
    ...(input.message ? [quoteHtml(input.message)] : []),
    p('What the snapshot shows:'),
    `<ul style="font-variant-numeric:tabular-nums">${input.summary.map(line => `<li>${escapeHtml(line)}</li>`).join('')}</ul>`,
  ], { url: input.url, label: 'Open the snapshot' }, [escapeHtml(RF_SAFETY_CAUTION)])
  return { subject, text, html }
}

export function mentionMail(input: {
  authorName: string; projectName: string; snapshotTitle: string; where: string; body: string; url: string
}): MailContent {
  const subject = `${input.authorName} mentioned you on “${input.snapshotTitle}”`
  const text = [
    `${input.authorName} mentioned you in a comment on ${input.where} of the snapshot “${input.snapshotTitle}” (${input.projectName}):`,
    '',
    quoteText(input.body),
    '',
    `Reply or read the thread: ${input.url}`,
  ].join('\n')
  const html = frame([
    p(`${escapeHtml(input.authorName)} mentioned you in a comment on ${escapeHtml(input.where)} of the snapshot <strong>“${escapeHtml(input.snapshotTitle)}”</strong> (${escapeHtml(input.projectName)}):`),
    quoteHtml(input.body),
  ], { url: input.url, label: 'Read the thread' })
  return { subject, text, html }
}

export function decisionMail(input: {
  deciderName: string; decision: ReviewDecision; note: string; snapshotTitle: string; projectName: string
  state: ReviewState; url: string
}): MailContent {
  const verb = reviewDecisionLabels[input.decision]
  const subject = `${input.deciderName} ${verb}: “${input.snapshotTitle}”`
  const text = [
    `${input.deciderName} ${verb} in the review of “${input.snapshotTitle}” (${input.projectName}).`,
    ...(input.note ? ['', quoteText(input.note)] : []),
    '',
    `The review is now: ${reviewStateLabels[input.state]}.`,
    '',
    `See the review: ${input.url}`,
  ].join('\n')
  const html = frame([
    p(`${escapeHtml(input.deciderName)} <strong>${verb}</strong> in the review of “${escapeHtml(input.snapshotTitle)}” (${escapeHtml(input.projectName)}).`),
    ...(input.note ? [quoteHtml(input.note)] : []),
    p(`The review is now: <strong>${reviewStateLabels[input.state]}</strong>.`),
  ], { url: input.url, label: 'See the review' })
  return { subject, text, html }
}

export function passwordResetMail(input: { name: string; url: string; expiresAt: Date }): MailContent {
  const until = input.expiresAt.toUTCString()
  const subject = 'Set a new Portwright password'
  const text = [
    `Hello ${input.name},`,
    '',
    'Someone — we hope you — asked to set a new password for your Portwright account.',
    `Set it with this link (it works once, until ${until}):`,
    input.url,
    '',
    'Setting a new password signs out every browser that is signed in to your account.',
    'If you did not ask for this, ignore this message: your password stays as it is.',
  ].join('\n')
  const html = frame([
    p(`Hello ${escapeHtml(input.name)},`),
    p('Someone — we hope you — asked to set a new password for your Portwright account.'),
    p(`The link works once, until ${escapeHtml(until)}. Setting a new password signs out every browser that is signed in to your account.`),
  ], { url: input.url, label: 'Set a new password' }, ['If you did not ask for this, ignore this message: your password stays as it is.'])
  return { subject, text, html }
}

export function passwordChangedMail(input: { name: string; how: 'changed' | 'reset'; when: Date; resetUrl: string }): MailContent {
  const when = input.when.toUTCString()
  const subject = 'Your Portwright password was changed'
  const what = input.how === 'changed'
    ? `Your password was changed on the account page on ${when}. Every other browser signed in to your account was signed out.`
    : `Your password was set with a reset link on ${when}. Every browser signed in to your account was signed out.`
  const text = [
    `Hello ${input.name},`,
    '',
    what,
    '',
    'If this was you, there is nothing more to do.',
    `If it was not, set a new password at once with this page and tell your site administrator: ${input.resetUrl}`,
  ].join('\n')
  const html = frame([
    p(`Hello ${escapeHtml(input.name)},`),
    p(escapeHtml(what)),
    p('If this was you, there is nothing more to do. If it was not, set a new password at once and tell your site administrator.'),
  ], { url: input.resetUrl, label: 'Set a new password' })
  return { subject, text, html }
}

/** What each role may do, in a sentence for the notice of being added. */
const roleAbilities: Record<ProjectRole, string> = {
  owner: 'you can change its networks, freeze and review them, and manage its members',
  editor: 'you can change its networks, freeze snapshots and ask for reviews',
  reviewer: 'you can read its networks, comment on snapshots and decide on reviews you are asked for',
  viewer: 'you can read its networks, snapshots and reviews',
}

export function memberAddedMail(input: {
  adderName: string; projectName: string; role: ProjectRole; url: string
}): MailContent {
  const subject = `You were added to “${input.projectName}” on Portwright`
  const text = [
    `${input.adderName} added you to the project “${input.projectName}” on Portwright as ${input.role}: ${roleAbilities[input.role]}.`,
    '',
    `Open the project: ${input.url}`,
    '',
    'Nothing else is needed; it is already in your list of projects. If you did not expect this, ask the person who added you, or another owner of the project, to remove you.',
  ].join('\n')
  const html = frame([
    p(`${escapeHtml(input.adderName)} added you to the project <strong>“${escapeHtml(input.projectName)}”</strong> on Portwright as <strong>${input.role}</strong>: ${roleAbilities[input.role]}.`),
    p('Nothing else is needed; it is already in your list of projects.'),
  ], { url: input.url, label: 'Open the project' }, ['If you did not expect this, ask the person who added you, or another owner of the project, to remove you.'])
  return { subject, text, html }
}
