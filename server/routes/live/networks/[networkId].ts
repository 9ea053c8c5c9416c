/**
 * Live co-editing of one network over the y-websocket wire protocol, on the
 * app's own port: ws(s)://<host>/live/networks/<networkId>. The upgrade is
 * admitted only with a session, a same-site Origin and a project role
 * (server/live/access.ts); the room does the rest (server/live/room.ts).
 */
import type { Peer } from 'crossws'
import { admitUpgrade, type LiveAdmission } from '../../../live/access'
import { useLiveHub } from '../../../live/hub'
import type { LivePeer } from '../../../live/room'

const livePeers = new WeakMap<Peer, LivePeer>()

function toLivePeer(peer: Peer, admission: LiveAdmission): LivePeer {
  return {
    id: peer.id,
    userId: admission.userId,
    name: admission.name,
    role: admission.role,
    sessionVersion: admission.sessionVersion,
    send: (data) => { peer.send(data) },
    close: (code, reason) => { peer.close(code, reason) },
  }
}

export default defineWebSocketHandler({
  async upgrade(request) {
    const verdict = await admitUpgrade(request)
    if (!verdict.ok) {
      if (verdict.status !== 401 && verdict.status !== 404) console.warn(`[live] upgrade refused (${verdict.status}): ${verdict.message}`)
      return new Response(verdict.message, { status: verdict.status, statusText: verdict.message })
    }
    request.context.live = verdict.admission
  },
  async open(peer) {
    const admission = peer.context.live as LiveAdmission | undefined
    if (!admission) {
      peer.close(4403, 'not admitted')
      return
    }
    const live = toLivePeer(peer, admission)
    livePeers.set(peer, live)
    await useLiveHub().join(admission.networkId, live)
  },
  message(peer, message) {
    const live = livePeers.get(peer)
    if (live) useLiveHub().receive(live, message.uint8Array())
  },
  async close(peer) {
    const live = livePeers.get(peer)
    livePeers.delete(peer)
    if (live) await useLiveHub().leave(live)
  },
  error(peer, error) {
    console.warn(`[live] websocket error: ${error.message}`)
  },
})
