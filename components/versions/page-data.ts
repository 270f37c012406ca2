import "server-only";
// Shared by the versions, diff and reviews pages: the signed-in member, their role and the
// document (notFound() otherwise), and members as mention handles.
import { notFound } from "next/navigation";
import { getWorkspaceDocument } from "@/db/documents";
import { listMembers } from "@/db/memberships";
import { isUuid } from "@/lib/authz";
import type { Action } from "@/lib/authz/policy";
import { HttpError } from "@/lib/http/errors";
import { handleOf } from "@/lib/versions/markup";
import { loadWorkspace } from "@/components/workspace/load-workspace";

export async function loadDocumentPage(workspaceId: string, documentId: string, action: Action = "version.read") {
  const { user, workspace } = await loadWorkspace(workspaceId, action);
  const document = isUuid(documentId) ? await getWorkspaceDocument({ workspaceId, documentId }) : null;
  if (!document) notFound();
  return { user, role: workspace.role, document };
}

/** 404 from a service call becomes the not-found page; other errors propagate. */
export async function orNotFound<T>(p: Promise<T>): Promise<T> {
  try {
    return await p;
  } catch (e) {
    if (e instanceof HttpError && e.status === 404) notFound();
    throw e;
  }
}

export async function mentionables(workspaceId: string) {
  const members = await listMembers({ workspaceId });
  return {
    members,
    handles: members.map((m) => ({ handle: handleOf(m, members), name: m.name })),
  };
}
