/** A safe download file name from a title: letters, digits, dash and underscore only. */
export function fileStem(title: string): string {
  const stem = title.normalize("NFKD").replace(/[\u0300-\u036f]/g, "").replace(/[^A-Za-z0-9_-]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 80);
  return stem || "scenario";
}

export function attachment(name: string): string {
  return `attachment; filename="${name}"`;
}
