/**
 * Live co-editing of one network over the y-websocket wire protocol, on the
 * app's own port: ws(s)://<host>/live/networks/<networkId>. The upgrade is
 * admitted only with a session, a same-site Origin and a project role
 * (server/live/access.ts); the room does the rest (server/live/room.ts).
 */
import type { Peer } from 'crossws'
import { admitUpgrade, type LiveAdmission } from '~~/server/live/access'
import { useLiveHub } from '~~/server/live/hub'
import type { LivePeer } from '~~/server/live/room'

const livePeers = new WeakMap<Peer, LivePeer>()
/** Unsent bytes past which a peer counts as too slow to keep (4508, a "try again" code: the client reconnects and syncs afresh). */
const SLOW_PEER_BYTES = 16 * 1024 * 1024

/** Largest websocket message accepted: the update limit plus room for the message's framing. */
function maxMessageBytes(): number {
  const configured = Number(process.env.PORTWRIGHT_LIVE_MAX_UPDATE_BYTES)
  return (Number.isFinite(configured) && configured > 0 ? configured : 1024 * 1024) + 64
}

function toLivePeer(peer: Peer, admission: LiveAdmission): LivePeer {
  return {
    id: peer.id,
    userId: admission.userId,
    name: admission.name,
    role: admission.role,
    sessionVersion: admission.sessionVersion,
    sessionId: admission.sessionId,
    send: (data) => {
      // A peer that does not read what it is sent is dropped before its backlog eats the server's memory.
      const socket = (peer as unknown as { websocket?: { bufferedAmount?: number } }).websocket
      if ((socket?.bufferedAmount ?? 0) > SLOW_PEER_BYTES) {
        peer.close(4508, 'connection too slow')
        return
      }
      peer.send(data)
    },
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
    if (!live) return
    const data = message.uint8Array()
    // Bigger than any update the room accepts plus its framing: refused before it is decoded.
    if (data.length > maxMessageBytes()) {
      console.warn(`[live] message of ${data.length} bytes from user ${live.userId} refused`)
      peer.close(4413, 'message too large')
      return
    }
    useLiveHub().receive(live, data)
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
