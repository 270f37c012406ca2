import "server-only";
// Shared by the export route handlers: who asks, for which document and version.
import type { RouteContext } from "@/lib/http/route";
import { loadExportSource, type ExportSource } from "./source";

export type ExportParams = { workspaceId: string; documentId: string };

/** ?version=<id> exports a saved version; without it, the document's current state. */
export async function exportSourceFor(ctx: RouteContext<ExportParams>): Promise<ExportSource> {
  const { user } = await ctx.requireUser();
  const versionId = new URL(ctx.request.url).searchParams.get("version");
  return loadExportSource({ userId: user.id, workspaceId: ctx.params.workspaceId, documentId: ctx.params.documentId, versionId: versionId || null });
}

export function download(body: string | Uint8Array<ArrayBuffer>, type: string, filename: string | null): Response {
  const headers: Record<string, string> = { "Content-Type": type, "Cache-Control": "no-store", "X-Content-Type-Options": "nosniff" };
  if (filename) headers["Content-Disposition"] = `attachment; filename="${filename}"`;
  return new Response(body, { status: 200, headers });
}
