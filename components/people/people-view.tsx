// The People screen's body: search and filters, the invite form, and the list (error → loading → empty → data).
import { useState } from 'react';
import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { ROLE_NAMES } from '@/shared/api';
import { PERSON_STATUSES, type PeopleFilter } from '@/shared/people';
import { usePeopleQuery } from '@/hooks/queries/people';
import { Button } from '@/components/button';
import { PageHeading } from '@/components/page-title';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { TextField } from '@/components/text-field';
import { ChoiceChips } from '@/components/windows/choice-chips';
import { InviteForm } from '@/components/people/invite-form';
import { PersonRow } from '@/components/people/person-row';
import { ROLE_LABELS, STATUS_LABELS } from '@/components/people/people-words';
import { colors, space, type } from '@/constants/theme';

type Props = { tenants: readonly { id: string; name: string }[]; viewerZone: string; myId: string };

export function PeopleView({ tenants, viewerZone, myId }: Props) {
  const [filter, setFilter] = useState<Partial<PeopleFilter>>({});
  const [inviting, setInviting] = useState(false);
  const people = usePeopleQuery(filter);
  const set = (key: keyof PeopleFilter) => (value: string) => setFilter((f) => ({ ...f, [key]: value === '' ? undefined : value }));
  const filtered = Object.values(filter).some((v) => v !== undefined);

  let list;
  if (people.isError) list = <ErrorState message={people.error.message} onRetry={() => void people.refetch()} />;
  else if (!people.data) list = <LoadingState label="Loading people…" />;
  else if (people.data.users.length === 0) {
    list = filtered
      ? <EmptyState title="Nobody matches these filters" hint="Clear the search or choose fewer filters." />
      : <EmptyState title="No people yet" hint="Invite the first person with the button above." />;
  } else {
    list = (
      <View role="list" aria-label="People" testID="people-list">
        <Text style={styles.count} testID="people-count">{people.data.users.length === 1 ? '1 person' : `${people.data.users.length} people`}</Text>
        {people.data.users.map((p) => <PersonRow key={p.id} person={p} tenants={tenants} viewerZone={viewerZone} isSelf={p.id === myId} />)}
      </View>
    );
  }

  return (
    <View style={styles.page}>
      <View style={styles.head}>
        <PageHeading>People</PageHeading>
        <Link href="/settings/sso" style={styles.link} testID="people-sso-settings">Single sign-on settings</Link>
      </View>
      {inviting ? <InviteForm tenants={tenants} onClose={() => setInviting(false)} /> : (
        <View style={styles.invite}><Button label="Invite someone" testID="people-invite-open" onPress={() => setInviting(true)} /></View>
      )}
      <View style={styles.filters} role="group" aria-label="Find people">
        <TextField label="Search by name or e-mail" testID="people-search" value={filter.q ?? ''} onChangeText={set('q')}
          autoCapitalize="none" autoCorrect={false} />
        <Text style={styles.label}>Role</Text>
        <ChoiceChips label="Role" testID="people-filter-role" value={filter.role ?? ''} onChange={set('role')}
          choices={ROLE_NAMES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))} />
        <Text style={styles.label}>State</Text>
        <ChoiceChips label="State" testID="people-filter-status" value={filter.status ?? ''} onChange={set('status')}
          choices={PERSON_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))} />
        {tenants.length > 0 ? (
          <>
            <Text style={styles.label}>Tenant</Text>
            <ChoiceChips label="Tenant" testID="people-filter-tenant" value={filter.tenant ?? ''} onChange={set('tenant')}
              choices={tenants.map((t) => ({ value: t.id, label: t.name }))} />
          </>
        ) : null}
      </View>
      {list}
    </View>
  );
}

const styles = StyleSheet.create({
  page: { gap: space.xl },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', justifyContent: 'space-between', gap: space.md },
  link: { ...type.bodyStrong, color: colors.primary, textDecorationLine: 'underline' },
  invite: { alignItems: 'flex-start' },
  filters: { gap: space.sm },
  label: { ...type.label, color: colors.ink },
  count: { ...type.caption, color: colors.inkMuted },
});
