// Imports (admin, planner): upload for a preview, apply it, and the list of past imports from GET /api/imports.
import { useMeQuery } from '@/hooks/queries/me';
import { canImportInventory } from '@/shared/permissions';
import { useImportsQuery } from '@/hooks/queries/imports';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { ImportsView } from '@/components/imports/imports-view';
import { usePageTitle } from '@/components/page-title';


export default function ImportsScreen() {
  const me = useMeQuery();
  const allowed = canImportInventory(me.data?.roles ?? []);
  const imports = useImportsQuery();
  usePageTitle('Imports');
  if (me.data && !allowed) return <EmptyState page title="Imports are for planners and admins" hint="Ask an admin if you need to load network data." />;
  if (imports.isError) return <ErrorState message={imports.error.message} onRetry={() => void imports.refetch()} />;
  if (!imports.data) return <LoadingState label="Loading past imports…" />;
  return <ImportsView history={imports.data.imports} />;
}
