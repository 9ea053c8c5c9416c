import type { Transaction } from 'sequelize'
import type { NetworkDocument } from '#shared/network/types'
import { applyDocumentToLiveState, mergeLiveState, notifyAccessChanged } from '~~/server/live/store'

/**
 * A document saved through the REST API joins the live document as an update
 * of its own, so open editors show it and the next merge keeps it. Pass the
 * save's transaction, so that the save and its log entry commit together.
 */
export async function liveDocumentSaved(networkId: string, document: NetworkDocument, userId: string, transaction?: Transaction): Promise<void> {
  // Not this instance's hub id: every instance, this one included, must fetch and apply the update.
  await applyDocumentToLiveState(networkId, document, userId, 'api', transaction)
}

/** Tells every app instance to re-check the roles of its live connections to this project now. */
export async function liveAccessChanged(projectId: string): Promise<void> {
  await notifyAccessChanged(projectId)
}

/** Tells every app instance to re-check its live connections now because sessions were revoked. */
export async function liveSessionsChanged(): Promise<void> {
  await notifyAccessChanged('sessions')
}

/**
 * Folds the live update log into the network before something reads it whole (a snapshot, a restore). A log that
 * cannot be merged into a valid document answers 409 and leaves everything as stored.
 */
export async function requireMergedLiveState(networkId: string): Promise<void> {
  const merged = await mergeLiveState(networkId)
  if (merged.invalid) {
    throw createError({ statusCode: 409, message: 'The live edits of this network could not be combined into a valid document; nothing was changed. Reload the editor and try again.' })
  }
}
