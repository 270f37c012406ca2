"use client";
// The comment threads of one page (a version or a diff), shared by every anchor on it. Mutations
// go through the API and replace the changed thread in place.
import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from "react";
import type { Anchor } from "@/lib/versions/anchors";
import * as client from "@/components/versions/api";
import type { ThreadJson } from "@/components/versions/api";

export interface Mentionable {
  handle: string;
  name: string;
}

interface ThreadsState {
  threads: ThreadJson[];
  /** the version new threads are anchored to (null: commenting is not possible on this page) */
  versionId: string | null;
  canWrite: boolean;
  canResolve: boolean;
  members: Mentionable[];
  create(anchor: Anchor, body: string): Promise<ThreadJson>;
  reply(threadId: string, body: string): Promise<void>;
  resolve(threadId: string, resolved: boolean): Promise<void>;
}

const Ctx = createContext<ThreadsState | null>(null);

export function useThreads(): ThreadsState {
  const v = useContext(Ctx);
  if (!v) throw new Error("useThreads outside ThreadsProvider");
  return v;
}

export function ThreadsProvider(props: {
  workspaceId: string;
  documentId: string;
  versionId: string | null;
  initial: ThreadJson[];
  canWrite: boolean;
  canResolve: boolean;
  members: Mentionable[];
  children: ReactNode;
}) {
  const { workspaceId: w, documentId: d, versionId } = props;
  const [threads, setThreads] = useState(props.initial);
  const put = useCallback((t: ThreadJson) => setThreads((all) => (all.some((x) => x.id === t.id) ? all.map((x) => (x.id === t.id ? t : x)) : [...all, t])), []);
  const value = useMemo<ThreadsState>(() => ({
    threads, versionId, canWrite: props.canWrite && versionId !== null, canResolve: props.canResolve, members: props.members,
    create: async (anchor, body) => {
      const t = await client.createThread(w, d, { versionId: versionId!, anchor, body });
      put(t);
      return t;
    },
    reply: async (threadId, body) => put(await client.replyToThread(w, d, threadId, body)),
    resolve: async (threadId, resolved) => put(await client.setThreadResolved(w, d, threadId, resolved)),
  }), [threads, versionId, props.canWrite, props.canResolve, props.members, w, d, put]);
  return <Ctx.Provider value={value}>{props.children}</Ctx.Provider>;
}
