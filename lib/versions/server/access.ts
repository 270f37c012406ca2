// Document access for the versions, threads and reviews services, plus the version lookup.
import { getVersion } from "@/db/versions";
import { isUuid } from "@/lib/authz";
import { NotFound } from "@/lib/http/errors";

export { assertNotArchived, authorizeDocument, type DocumentAccess } from "@/lib/documents/access";

export async function requireVersion(args: { documentId: string; versionId: string }) {
  const version = isUuid(args.versionId) ? await getVersion(args) : null;
  if (!version) throw new NotFound("version not found");
  return version;
}
