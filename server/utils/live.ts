import type { NetworkDocument } from '../../shared/network/types'
import { applyDocumentToLiveState, notifyAccessChanged } from '../live/store'

/**
 * A document saved through the REST API joins the live document as an update
 * of its own, so open editors show it and the next merge keeps it.
 */
export async function liveDocumentSaved(networkId: string, document: NetworkDocument, userId: string): Promise<void> {
  // Not this instance's hub id: every instance, this one included, must fetch and apply the update.
  await applyDocumentToLiveState(networkId, document, userId, 'api')
}

/** Tells every app instance to re-check the roles of its live connections to this project now. */
export async function liveAccessChanged(projectId: string): Promise<void> {
  await notifyAccessChanged(projectId)
}
