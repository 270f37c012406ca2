"use client";
// Entry of the document page on the client: opens the shared document and renders the notebook.
// The collaboration URL comes from the server at request time (never baked into the bundle).
import { useMemo } from "react";
import type { PowertrainKind } from "@/lib/notebook";
import type { SummaryKpi } from "@/lib/client/notebook/documents-api";
import { makePresenceUser } from "@/lib/client/notebook/presence";
import { useCollab } from "@/lib/client/notebook/use-collab";
import { Notebook } from "./notebook";

export interface NotebookClientProps {
  workspaceId: string;
  documentId: string;
  collabUrl: string | null;
  role: string;
  canEdit: boolean;
  archived: boolean;
  user: { id: string; name: string };
  name: string;
  powertrain: PowertrainKind | null;
  /** headline figures stored with the document (null when none yet) */
  summary: SummaryKpi | null;
}

export function NotebookClient(props: NotebookClientProps) {
  const user = useMemo(() => makePresenceUser(props.user), [props.user]);
  // The document's own API route: same session and membership rules as the collaboration upgrade.
  const accessUrl = `/api/workspaces/${encodeURIComponent(props.workspaceId)}/documents/${encodeURIComponent(props.documentId)}`;
  const collab = useCollab({ collabUrl: props.collabUrl, documentId: props.documentId, accessUrl, user });
  if (!collab) return <p className="py-section text-center text-sm text-muted">Opening the document…</p>;
  return (
    <Notebook collab={collab} canEdit={props.canEdit} archived={props.archived} role={props.role} workspaceId={props.workspaceId} documentId={props.documentId}
      fallbackName={props.name} fallbackPowertrain={props.powertrain} storedSummary={props.summary} />
  );
}
