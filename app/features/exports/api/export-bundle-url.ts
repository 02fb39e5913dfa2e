// GET /api/exports/:runId/bundle: the finished run's ZIP. The browser downloads it itself (a plain
// link, sent with the session cookie), so there is no fetcher here, only the address.
export function exportBundleUrl(runId: number): string {
  return `/api/exports/${runId}/bundle`;
}
