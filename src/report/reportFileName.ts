/**
 * "coilsift-report-<design>-<YYYY-MM-DD>.html": the design name reduced to safe ASCII for every
 * file system, the UTC date so that reports of one design sort by day.
 */
export function reportFileName(designName: string, generatedAt: string): string {
  const slug =
    designName
      .normalize("NFKD")
      .replace(/[\u0300-\u036f]/g, "")
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "")
      .slice(0, 60)
      .replace(/-+$/, "") || "design";
  return `coilsift-report-${slug}-${generatedAt.slice(0, 10)}.html`;
}
