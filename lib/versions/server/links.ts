// Addresses of our pages, absolute for e-mails (APP_URL) and relative for the UI.
const enc = encodeURIComponent;

export function documentPath(workspaceId: string, documentId: string): string {
  return `/w/${enc(workspaceId)}/documents/${enc(documentId)}`;
}

export function versionPath(workspaceId: string, documentId: string, versionId: string): string {
  return `${documentPath(workspaceId, documentId)}/versions/${enc(versionId)}`;
}

/** `to` may be "live" (the document as it is now). */
export function diffPath(workspaceId: string, documentId: string, from: string, to: string): string {
  return `${documentPath(workspaceId, documentId)}/diff?from=${enc(from)}&to=${enc(to)}`;
}

export function reviewsPath(workspaceId: string, documentId: string, roundId?: string): string {
  return `${documentPath(workspaceId, documentId)}/reviews${roundId ? `#round-${enc(roundId)}` : ""}`;
}

export function absolute(path: string): string {
  const base = (process.env.APP_URL ?? "http://127.0.0.1:3210").replace(/\/+$/, "");
  return base + path;
}
