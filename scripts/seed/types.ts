// What seed steps share: later steps (documents, versions, reviews) read the ids set by earlier ones.
export type SeedContext = {
  demoWorkspaceId?: string;
  /** e-mail → user id of the demo users */
  userIds?: Map<string, string>;
};

export type SeedStep = { name: string; run(ctx: SeedContext): Promise<void> };
