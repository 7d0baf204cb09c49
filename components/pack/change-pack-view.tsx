// The change-board pack as one document: title, the window, MOP, impact, the accepted plan's moves and steps, the
// references, risk, decisions and comments, and when it was generated. On the web it prints (or saves as PDF)
// through the browser, with the print stylesheet taking the app's frame away.
import { useEffect } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import type { ChangePack } from '@/shared/change-pack';
import { Button } from '@/components/button';
import { describeZone, formatInstant } from '@/components/time';
import { Section } from '@/components/windows/section';
import { colors, CONTENT_MAX_WIDTH_PX, space, type } from '@/constants/theme';
import { PackComments, PackDecisions } from './pack-decisions';
import { PackMoves, PackReferences, PackRisk, PackSteps } from './pack-plan';
import { PACK_ROOT_ID } from './pack-root-id';
import { PackCaution, PackImpact, PackWindowFacts } from './pack-window-facts';
import { CAN_PRINT, installPackPrintStyle, printPage } from './print-style';

type Props = { pack: ChangePack; timeZone: string; onDownloadMoves: () => void };

function Actions({ pack, onDownloadMoves }: Pick<Props, 'pack' | 'onDownloadMoves'>) {
  return (
    <View style={styles.actions}>
      {CAN_PRINT ? <Button label="Print or save as PDF" onPress={printPage} testID="pack-print" /> : null}
      {pack.plan ? <Button label="Download moves (CSV)" variant="quiet" onPress={onDownloadMoves} testID="pack-moves-csv" /> : null}
    </View>
  );
}

export function ChangePackView({ pack, timeZone, onDownloadMoves }: Props) {
  useEffect(() => installPackPrintStyle(), []);
  return (
    <ScrollView contentContainerStyle={styles.page}>
      <View style={styles.column} nativeID={PACK_ROOT_ID} testID="change-pack">
        <Text style={styles.kicker}>Change-board pack</Text>
        <Text style={styles.title} role="heading" aria-level={1} testID="pack-title">{pack.window.title}</Text>
        <Actions pack={pack} onDownloadMoves={onDownloadMoves} />
        <PackWindowFacts pack={pack} timeZone={timeZone} />
        <PackCaution pack={pack} />
        <PackImpact pack={pack} />
        {pack.plan ? (
          <>
            <PackMoves plan={pack.plan} timeZone={timeZone} />
            <PackSteps plan={pack.plan} />
            <PackReferences plan={pack.plan} />
            <PackRisk plan={pack.plan} />
          </>
        ) : (
          <Section title="Move plan" testID="pack-no-plan">
            <Text style={styles.body}>No plan yet: no move plan has been accepted for this window.</Text>
          </Section>
        )}
        <PackDecisions pack={pack} timeZone={timeZone} />
        <PackComments pack={pack} timeZone={timeZone} />
        <Text style={styles.muted} testID="pack-generated">
          Generated {formatInstant(pack.generatedAt, timeZone)} by Slackwater · times in {describeZone(timeZone)}
        </Text>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, alignItems: 'center' },
  column: { width: '100%', maxWidth: CONTENT_MAX_WIDTH_PX, gap: space.md },
  kicker: { ...type.label, color: colors.inkMuted },
  title: { ...type.title, color: colors.abyss },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
