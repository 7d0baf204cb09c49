// Imports (admin, planner): upload for a preview, apply it, and the list of past imports from GET /api/imports.
import { useMeQuery } from '@/hooks/queries/me';
import { useImportsQuery } from '@/hooks/queries/imports';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { ImportsView } from '@/components/imports/imports-view';

const IMPORT_ROLES = ['admin', 'planner'] as const;

export default function ImportsScreen() {
  const me = useMeQuery();
  const allowed = me.data?.roles.some((role) => (IMPORT_ROLES as readonly string[]).includes(role)) ?? false;
  const imports = useImportsQuery();
  if (me.data && !allowed) return <EmptyState title="Imports are for planners and admins" hint="Ask an admin if you need to load network data." />;
  if (imports.isError) return <ErrorState message={imports.error.message} onRetry={() => void imports.refetch()} />;
  if (!imports.data) return <LoadingState label="Loading past imports…" />;
  return <ImportsView history={imports.data.imports} />;
}
