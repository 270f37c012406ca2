// Client side of the versions, threads and reviews API. Shapes as the route handlers return them.
import { api } from "@/lib/client/api";
import type { Anchor } from "@/lib/versions/anchors";
import type { VersionJson } from "@/lib/versions/server/versions";
import type { ThreadJson } from "@/lib/versions/server/threads";
import type { RoundJson } from "@/lib/versions/server/reviews";

export type { VersionJson, ThreadJson, RoundJson };

const enc = encodeURIComponent;
const doc = (w: string, d: string) => `/api/workspaces/${enc(w)}/documents/${enc(d)}`;

export async function saveVersion(w: string, d: string, body: { name: string; message: string }): Promise<VersionJson> {
  return (await api<{ version: VersionJson }>(`${doc(w, d)}/versions`, "POST", body)).version;
}

export async function restoreVersion(w: string, d: string, versionId: string): Promise<{ changed: boolean; deliveredLive: boolean }> {
  return api(`${doc(w, d)}/versions/${enc(versionId)}/restore`, "POST", {});
}

export async function listThreads(w: string, d: string, versionId?: string): Promise<ThreadJson[]> {
  const q = versionId ? `?versionId=${enc(versionId)}` : "";
  return (await api<{ threads: ThreadJson[] }>(`${doc(w, d)}/threads${q}`)).threads;
}

export async function createThread(w: string, d: string, body: { versionId: string; anchor: Anchor; body: string }): Promise<ThreadJson> {
  return (await api<{ thread: ThreadJson }>(`${doc(w, d)}/threads`, "POST", body)).thread;
}

export async function replyToThread(w: string, d: string, threadId: string, body: string): Promise<ThreadJson> {
  return (await api<{ thread: ThreadJson }>(`${doc(w, d)}/threads/${enc(threadId)}/comments`, "POST", { body })).thread;
}

export async function setThreadResolved(w: string, d: string, threadId: string, resolved: boolean): Promise<ThreadJson> {
  return (await api<{ thread: ThreadJson }>(`${doc(w, d)}/threads/${enc(threadId)}`, "PATCH", { resolved })).thread;
}

export async function requestReview(w: string, d: string, body: { versionId: string; reviewerIds: string[]; message: string }): Promise<RoundJson> {
  return (await api<{ round: RoundJson }>(`${doc(w, d)}/reviews`, "POST", body)).round;
}

export async function giveVerdict(w: string, d: string, roundId: string, body: { verdict: "approve" | "changes_requested"; comment: string }): Promise<RoundJson> {
  return (await api<{ round: RoundJson }>(`${doc(w, d)}/reviews/${enc(roundId)}/verdict`, "POST", body)).round;
}
