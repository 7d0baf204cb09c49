// The session list wired to the API: the signed-in user's sessions, ending one, and signing out everywhere.
import { useEndSessionMutation, useMySessionsQuery, useSignOutEverywhereMutation } from '@/hooks/queries/sessions';
import { SessionsSection } from './sessions-section';

export function SessionsPanel({ onSignedOutEverywhere, timeZone }: { onSignedOutEverywhere: () => void; timeZone: string }) {
  const list = useMySessionsQuery();
  const end = useEndSessionMutation();
  const everywhere = useSignOutEverywhereMutation();
  const actionError = end.error ? `That session could not be ended: ${end.error.message}`
    : everywhere.error ? `Signing out everywhere failed: ${everywhere.error.message}` : null;
  return (
    <SessionsSection
      sessions={list.data?.sessions}
      loadError={list.isError ? list.error.message : null}
      onRetry={() => void list.refetch()}
      timeZone={timeZone}
      endingId={end.isPending ? end.variables : null}
      onEnd={(id) => end.mutate(id)}
      signingOutEverywhere={everywhere.isPending}
      onSignOutEverywhere={() => everywhere.mutate(undefined, { onSuccess: onSignedOutEverywhere })}
      actionError={actionError}
    />
  );
}
