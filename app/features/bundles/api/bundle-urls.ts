// GET /api/projects/:projectId/bundle and GET /api/figures/:figureId/bundle: Lobewright bundles
// (JSON). The browser downloads them itself (a plain link with the session cookie), so there is no
// fetcher here, only the addresses.
export function projectBundleUrl(projectId: number): string {
  return `/api/projects/${projectId}/bundle`;
}

export function figureBundleUrl(figureId: number): string {
  return `/api/figures/${figureId}/bundle`;
}
