// One window: when (in the viewer's zone, named), where it stands, what it takes out, its MOP, conflicts and actions.
import type { ReactNode } from 'react';
import { Linking, ScrollView, StyleSheet, Text, View } from 'react-native';
import type { Me } from '@/shared/api';
import type { Window } from '@/shared/windows';
import { useWindowAssessMutation, useWindowConflictsQuery, useWindowTransitionMutation, windowMopUrl } from '@/hooks/queries/windows';
import { Button } from '@/components/button';
import { describeZone, formatDuration } from '@/components/time';
import { ZonedWhen } from '@/components/time/zoned-when';
import { ConflictsList } from '@/components/windows/conflicts-list';
import { windowActions } from '@/components/windows/lifecycle';
import { LifecycleLine } from '@/components/windows/lifecycle-line';
import { formatBytes } from '@/components/windows/mop-file';
import { Section } from '@/components/windows/section';
import { StatusBadge } from '@/components/windows/status-badge';
import { WindowActionsBar } from '@/components/windows/window-actions-bar';
import { WindowElementsList } from '@/components/windows/window-elements-list';
import { WindowNextStep } from '@/components/windows/window-next-step';
import { WindowNotices, type WindowFlash } from '@/components/windows/window-notices';
import { WindowTimeline } from '@/components/windows/window-timeline';
import { saveErrorView } from '@/components/windows/window-save-errors';
import { colors, CONTENT_MAX_WIDTH_PX, space, type } from '@/constants/theme';

type Props = {
  window: Window;
  me: Me;
  timeZone: string;
  flash: WindowFlash;
  onEdit: () => void;
  onOpenImpact: () => void;
  onOpenWindow: (id: string) => void;
  onReload: () => void;
  /** Blocks other areas add below the actions (move plans, sign-off), each self-contained. */
  children?: ReactNode;
};

function Conflicts({ window, timeZone, onOpenWindow }: Pick<Props, 'window' | 'timeZone' | 'onOpenWindow'>) {
  const conflicts = useWindowConflictsQuery(window.id);
  if (conflicts.isError) return <Text style={styles.error}>Could not load conflicts: {conflicts.error.message}</Text>;
  if (!conflicts.data) return <Text style={styles.muted}>Checking for conflicts…</Text>;
  return <ConflictsList conflicts={conflicts.data.conflicts} timeZone={timeZone} onOpenWindow={onOpenWindow} />;
}

export function WindowDetail({ window: w, me, timeZone, flash, onEdit, onOpenImpact, onOpenWindow, onReload, children }: Props) {
  const assess = useWindowAssessMutation(w.id);
  const transition = useWindowTransitionMutation(w.id);
  const actionError = assess.error ?? transition.error;
  const stale = saveErrorView(actionError).stale;
  const durationMs = Date.parse(w.endsAt) - Date.parse(w.startsAt);
  return (
    <ScrollView contentContainerStyle={styles.page}>
      <View style={styles.column}>
        <Text style={styles.title} role="heading" aria-level={1} testID="window-title-heading">{w.title}</Text>
        <StatusBadge status={w.status} testID="window-status" />
        <ZonedWhen startsAt={w.startsAt} endsAt={w.endsAt} timeZone={timeZone} style={styles.when} testID="window-when" />
        <Text style={styles.muted}>Lasts {formatDuration(durationMs)} · times in {describeZone(timeZone)}{w.workType ? ` · ${w.workType}` : ''}</Text>
        <WindowNotices flash={flash} window={w} />
        <LifecycleLine status={w.status} />
        {actionError ? (
          <View style={styles.row} role="alert" testID="window-action-error">
            <Text style={styles.error}>{stale ? 'Someone else changed this window — reload to see their changes.' : actionError.message}</Text>
            {stale ? <Button label="Reload" variant="quiet" onPress={() => { assess.reset(); transition.reset(); onReload(); }} /> : null}
          </View>
        ) : null}
        <WindowNextStep window={w} me={me} here={{ screen: 'window' }} />
        <WindowActionsBar
          windowId={w.id}
          actions={windowActions(me.roles, w.status)}
          impactStored={w.impactStored}
          assessing={assess.isPending}
          transitioning={transition.isPending}
          onEdit={onEdit}
          onOpenImpact={onOpenImpact}
          onAssess={() => assess.mutate(w.version, { onSuccess: onOpenImpact })}
          onWithdraw={() => transition.mutate({ to: 'withdrawn', version: w.version })}
          onRollBack={() => transition.mutate({ to: 'rolled-back', version: w.version })}
        />
        {children}
        <Section title="Taken out">
          <WindowElementsList elements={w.elements} />
        </Section>
        <Section title="Conflicts" aside={w.conflictCount > 0 ? <Text style={styles.error}>{w.conflictCount}</Text> : null}>
          <Conflicts window={w} timeZone={timeZone} onOpenWindow={onOpenWindow} />
        </Section>
        <Section title="Method of procedure">
          {w.mop ? (
            <View style={styles.row}>
              <Text style={styles.body}>{w.mop.fileName} ({formatBytes(w.mop.sizeBytes)})</Text>
              <Button label="Download" variant="quiet" onPress={() => void Linking.openURL(windowMopUrl(w.id))} testID="window-mop-download" />
            </View>
          ) : (
            <Text style={styles.muted}>No MOP attached yet.</Text>
          )}
        </Section>
        <Section title="Details">
          <Text style={styles.body}>Booked by {w.owner?.name ?? 'someone no longer listed'}</Text>
          {w.notes ? <Text style={styles.body}>{w.notes}</Text> : <Text style={styles.muted}>No notes.</Text>}
          {w.freezeOverrideReason ? <Text style={styles.body}>Booked inside a freeze. Reason given: {w.freezeOverrideReason}</Text> : null}
        </Section>
        <WindowTimeline windowId={w.id} me={me} timeZone={timeZone} />
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, alignItems: 'center' },
  column: { width: '100%', maxWidth: CONTENT_MAX_WIDTH_PX * 0.75, gap: space.md },
  title: { ...type.title, color: colors.abyss },
  when: { ...type.bodyStrong, color: colors.ink },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.bodyStrong, color: colors.danger },
});
