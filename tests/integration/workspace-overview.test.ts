// The workspace overview's document figures (components/workspace/overview-data.ts) against real
// PostgreSQL: the count and order agree with the documents list (updated, newest first; archived
// left out; app/api/.../documents), and only rounds still waiting for verdicts count as open
// (product rule, db/reviews.ts roundState: any "changes requested" closes a round).
import { beforeAll, describe, expect, it } from "vitest";
import * as reviewsRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/reviews/route";
import * as verdictRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/reviews/[roundId]/verdict/route";
import { setDocumentArchived, setDocumentSummary, touchDocument } from "@/db/documents";
import { loadOverviewDocuments } from "@/components/workspace/overview-data";
import { headlineFigure } from "@/components/workspace/headline-figure";
import { bodyOf, call } from "./support/http";
import { teamWorkspace } from "./support/users";
import { params, saveVersion, vanDocument, type Team } from "./versions-support";

let team: Team;
beforeAll(async () => {
  team = await teamWorkspace();
});

async function askReview(documentId: string): Promise<string> {
  const v = (await saveVersion(team, documentId, team.editor, "for review")).body.version;
  const res = await call(reviewsRoute.POST, "POST", "/", { cookie: team.editor.cookie, params: params(team, documentId), body: { versionId: v.id, reviewerIds: [team.reviewer.id], message: "" } });
  expect(res.status).toBe(201);
  return (await bodyOf(res)).round.id;
}

describe("workspace overview documents", () => {
  it("an empty workspace has none (the only case for the empty state)", async () => {
    expect(await loadOverviewDocuments(team.workspaceId)).toEqual({ total: 0, recent: [], openRounds: [] });
  });

  it("counts the documents that are not archived, lists the five updated last, and the open rounds", async () => {
    const ids: string[] = [];
    for (let k = 1; k <= 7; k++) {
      ids.push(await vanDocument(team, `Van ${k}`));
      await new Promise((r) => setTimeout(r, 5)); // distinct updated_at, in creation order
    }
    await setDocumentArchived({ documentId: ids[6]!, archived: true }); // "Van 7" is archived
    await touchDocument({ documentId: ids[0]! }); // "Van 1" edited last
    await setDocumentSummary({ documentId: ids[0]!, summary: { kpi: { fuel_l_per_100km: 6.234, feasible: true } } });
    const open = await askReview(ids[1]!);
    const closed = await askReview(ids[2]!);
    const v = await call(verdictRoute.POST, "POST", "/", { cookie: team.reviewer.cookie, params: params(team, ids[2]!, { roundId: closed }), body: { verdict: "changes_requested", comment: "payload too low" } });
    expect(v.status).toBe(200);

    const o = await loadOverviewDocuments(team.workspaceId);
    expect(o.total).toBe(6);
    // Saving a version or reviewing does not count as editing the document; Van 1 was touched last.
    expect(o.recent.map((d) => d.name)).toEqual(["Van 1", "Van 6", "Van 5", "Van 4", "Van 3"]);
    expect(o.recent.map((d) => d.name)).not.toContain("Van 7");
    expect(headlineFigure(o.recent[0]!.powertrain, o.recent[0]!.summary)).toBe("6.23 L/100 km");
    expect(o.openRounds).toEqual([{ documentId: ids[1], documentName: "Van 2", roundId: open, versionNumber: 1 }]);
  });

  it("headline figure: electric energy for a battery-electric car, fuel otherwise; no figure is said so", () => {
    expect(headlineFigure("bev", { kpi: { electric_kwh_per_100km: 17.456, fuel_l_per_100km: 0 } })).toBe("17.46 kWh/100 km");
    expect(headlineFigure("series", { kpi: { fuel_l_per_100km: 5.0 } })).toBe("5.00 L/100 km");
    expect(headlineFigure("conventional", null)).toBe("not evaluated yet");
    expect(headlineFigure("parallel", { kpi: { fuel_l_per_100km: null } })).toBe("not evaluated yet");
  });
});
