import "server-only";
// POST /api/evaluate accepts `cycle: { "library_id": "<id>" }` in a Scenario: the engine cannot
// read the library, so the route replaces the reference with the item's samples first. The
// workspace is the API token's own, or `?workspace=<id>` for a signed-in browser session.
import { getLibraryItemsData } from "@/db/library";
import { authorizeWorkspace, isUuid } from "@/lib/authz";
import { Unprocessable } from "@/lib/http/errors";
import { currentTokenScope } from "@/lib/tokens/scope";

const FIELD = "cycle.library_id";

export async function resolveScenarioLibrary(args: { userId: string; body: unknown; workspaceId: string | null }): Promise<unknown> {
  const body = args.body;
  if (!body || typeof body !== "object" || Array.isArray(body)) return body;
  const cycle = (body as Record<string, unknown>).cycle;
  if (!cycle || typeof cycle !== "object" || !("library_id" in cycle)) return body;
  const { library_id: id, ...rest } = cycle as Record<string, unknown>;
  if (Object.keys(rest).length > 0) throw new Unprocessable({ [FIELD]: `give either library_id or the cycle itself, not both (also got ${Object.keys(rest).join(", ")})` });
  if (typeof id !== "string" || !isUuid(id)) throw new Unprocessable({ [FIELD]: "must be the id of a drive cycle in the workspace library" });
  const workspaceId = currentTokenScope()?.workspaceId ?? args.workspaceId;
  if (!workspaceId) throw new Unprocessable({ [FIELD]: "name the workspace of the library: POST /api/evaluate?workspace=<id> (an API token uses its own)" });
  await authorizeWorkspace({ userId: args.userId, workspaceId, action: "library.read" });
  const [item] = await getLibraryItemsData({ workspaceId, itemIds: [id] });
  if (!item) throw new Unprocessable({ [FIELD]: `no item "${id}" in this workspace's library` });
  if (item.kind !== "cycle") throw new Unprocessable({ [FIELD]: `"${item.name}" is not a drive cycle` });
  return { ...body, cycle: item.data };
}
