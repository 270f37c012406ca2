// Presence (awareness) state of one person in a document: name and colour for the presence
// bar and remote cursors (y-codemirror.next reads `user.name/color/colorLight`), and the block
// they are working on.
import type { Awareness } from "y-protocols/awareness";

export interface PresenceUser {
  id: string;
  name: string;
  color: string;
  colorLight: string;
}

export interface Peer {
  clientId: number;
  user: PresenceUser;
  blockId: string | null;
  self: boolean;
}

// Our own palette: deep, legible on the paper background; light variants for selections.
const PALETTE: [string, string][] = [
  ["#1b6a80", "#1b6a8033"], ["#a8501a", "#a8501a33"], ["#8a3a5c", "#8a3a5c33"], ["#2e6b45", "#2e6b4533"],
  ["#5a4a9c", "#5a4a9c33"], ["#8a6200", "#8a620033"], ["#2d5d9a", "#2d5d9a33"], ["#7a4a2a", "#7a4a2a33"],
];

/** A stable colour per user id (FNV-1a hash), so a person keeps their colour across visits. */
export function presenceColor(userId: string): [string, string] {
  let h = 0x811c9dc5;
  for (let i = 0; i < userId.length; i++) h = Math.imul(h ^ userId.charCodeAt(i), 0x01000193) >>> 0;
  return PALETTE[h % PALETTE.length]!;
}

export function makePresenceUser(user: { id: string; name: string }): PresenceUser {
  const [color, colorLight] = presenceColor(user.id);
  return { id: user.id, name: user.name, color, colorLight };
}

function isUser(x: unknown): x is PresenceUser {
  const u = x as Partial<PresenceUser> | null;
  return !!u && typeof u.name === "string" && typeof u.color === "string";
}

/** Everyone in the document with a valid presence state, oneself first. */
export function readPeers(awareness: Awareness): Peer[] {
  const peers: Peer[] = [];
  awareness.getStates().forEach((state, clientId) => {
    if (!isUser(state.user)) return;
    const blockId = typeof state.block === "string" ? state.block : null;
    peers.push({ clientId, user: state.user, blockId, self: clientId === awareness.clientID });
  });
  return peers.sort((a, b) => Number(b.self) - Number(a.self) || a.user.name.localeCompare(b.user.name));
}

export function setFocusedBlock(awareness: Awareness, blockId: string | null): void {
  if (awareness.getLocalState()?.block === blockId) return;
  awareness.setLocalStateField("block", blockId);
}
