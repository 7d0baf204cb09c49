// One window in the day's agenda: status (in words and tone), title, its time in the viewer's zone, elements and
// badges. A link to the window (or, for a tenant, its notice): Tab reaches it, Enter and Space open it.
import { Link, useRouter, type Href } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';
import { formatDuration, formatWindowRange } from '@/components/time';
import { STATUS_LABELS } from '@/components/windows/lifecycle';
import type { CalendarWindow } from './calendar-types';
import { statusColor } from './calendar-marks';
import { keyDownProps, linkKeyProps, type KeyPress } from '@/components/key-props';
import { WindowBadges } from './window-badges';

/**
 * `href` makes the row a real link (open in a new tab works too); without one (undefined), `onOpen` makes it a
 * link-role element opening on a press, Enter or Space; with neither (or a null href) it is plain text.
 */
/** A site's or span's name by kind and id; without one the ids show. */
export type ElementNamer = (kind: 'site' | 'span', id: string) => string;
const idOnly: ElementNamer = (_kind, id) => id;

type Props = { window: CalendarWindow; timeZone: string; onOpen?: (id: string) => void; href?: Href | null; elementName?: ElementNamer };

const MAX_ELEMENTS_SHOWN = 3;

/** The window's equipment by name ("Orrindale, Orrindale – Vellaport (reduced)"), the first few and a count. */
function elementSummary(window: CalendarWindow, nameOf: ElementNamer): string {
  const names = window.elements.map((e) => `${nameOf(e.kind, e.id)}${e.effect === 'reduced' ? ' (reduced)' : ''}`);
  if (names.length === 0) return 'No elements yet';
  const shown = names.slice(0, MAX_ELEMENTS_SHOWN).join(', ');
  return names.length > MAX_ELEMENTS_SHOWN ? `${shown} +${names.length - MAX_ELEMENTS_SHOWN}` : shown;
}

function RowContent({ window, timeZone, linked, nameOf }: { window: CalendarWindow; timeZone: string; linked: boolean; nameOf: ElementNamer }) {
  const tone = statusColor(window.status);
  const durationMs = Date.parse(window.endsAt) - Date.parse(window.startsAt);
  return (
    <View style={styles.row}>
      <View style={[styles.stripe, { backgroundColor: tone }]} />
      <View style={styles.main}>
        <View style={styles.titleLine}>
          <Text style={styles.title} numberOfLines={2}>
            {window.title}
          </Text>
          <Text style={[styles.status, { borderColor: tone }]}>{window.statusLabel ?? STATUS_LABELS[window.status]}</Text>
        </View>
        <Text style={styles.when} testID={`agenda-window-${window.id}-when`}>
          {formatWindowRange(window.startsAt, window.endsAt, timeZone)} · {formatDuration(durationMs)}
        </Text>
        <Text style={styles.elements} numberOfLines={1}>
          {window.detail ?? `${window.workType ? `${window.workType} · ` : ''}${elementSummary(window, nameOf)}`}
        </Text>
        <WindowBadges window={window} />
      </View>
      {linked ? <Text style={styles.chevron} aria-hidden>›</Text> : null}
    </View>
  );
}

const isSpace = (key: string) => key === ' ' || key === 'Spacebar';

export function AgendaRow({ window, timeZone, onOpen, href, elementName = idOnly }: Props) {
  const router = useRouter();
  const linked = href ? true : href === undefined && onOpen !== undefined;
  const content = <RowContent window={window} timeZone={timeZone} linked={linked} nameOf={elementName} />;
  if (href) {
    // Enter follows the link natively; Space, which a link ignores, opens it too, as people press either on a row.
    const openOnSpace = (event: KeyPress) => {
      if (!isSpace(event.key)) return;
      event.preventDefault?.();
      router.push(href);
    };
    return (
      <Link href={href} asChild>
        <Pressable role="link" testID={`agenda-window-${window.id}`} {...keyDownProps(openOnSpace)} style={styles.link}>
          {content}
        </Pressable>
      </Link>
    );
  }
  if (!linked || !onOpen) {
    return (
      <View testID={`agenda-window-${window.id}`}>
        {content}
      </View>
    );
  }
  return (
    <Pressable
      role="link"
      testID={`agenda-window-${window.id}`}
      onPress={() => onOpen(window.id)}
      {...linkKeyProps(() => onOpen(window.id))}
      style={({ pressed }) => [styles.link, pressed && styles.pressed]}
    >
      {content}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  link: { borderRadius: radii.md },
  pressed: { backgroundColor: colors.primarySoft },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingVertical: space.md,
    paddingRight: space.md,
    borderRadius: radii.md,
  },
  stripe: { width: 5, alignSelf: 'stretch', borderRadius: radii.sm },
  main: { flex: 1, gap: space.xs },
  titleLine: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm },
  title: { ...type.bodyStrong, color: colors.ink, flex: 1 },
  status: {
    ...type.caption,
    color: colors.ink,
    borderWidth: 1.5,
    borderRadius: radii.pill,
    paddingHorizontal: space.sm,
    paddingVertical: 1,
  },
  when: { ...type.body, fontSize: 14, color: colors.ink },
  elements: { ...type.caption, color: colors.inkMuted },
  chevron: { fontSize: 22, color: colors.inkFaint },
});
