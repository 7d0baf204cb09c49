// Errors or warnings of an import, each located by file and row (CSV) or path (JSON, GraphML) with a plain message.
import { StyleSheet, Text, View } from 'react-native';
import type { ImportIssue } from '@/shared/imports';
import { colors, radii, space, type } from '@/constants/theme';

export function issueLocation(issue: ImportIssue): string {
  const where = [issue.file];
  if (issue.row !== undefined) where.push(`row ${issue.row}`);
  if (issue.path) where.push(issue.path);
  return where.join(' · ');
}

type Props = { issues: readonly ImportIssue[]; tone: 'error' | 'warning'; testID: string };

export function IssueList({ issues, tone, testID }: Props) {
  if (issues.length === 0) return null;
  const error = tone === 'error';
  return (
    <View style={[styles.box, error ? styles.errorBox : styles.warningBox]} testID={testID} role={error ? 'alert' : undefined}>
      <Text style={[styles.title, { color: error ? colors.danger : colors.warning }]}>
        {error ? `${issues.length} ${issues.length === 1 ? 'error' : 'errors'} — nothing can be applied until they are fixed` : `${issues.length} ${issues.length === 1 ? 'warning' : 'warnings'}`}
      </Text>
      {issues.map((issue, index) => (
        <View key={index} style={styles.item} testID={`${testID}-${index}`}>
          <Text style={styles.where}>{issueLocation(issue)}</Text>
          <Text style={styles.message}>{issue.message}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderRadius: radii.md, borderLeftWidth: 4, padding: space.md, gap: space.sm },
  errorBox: { backgroundColor: colors.dangerSoft, borderLeftColor: colors.danger },
  warningBox: { backgroundColor: colors.tide, borderLeftColor: colors.warning },
  title: { ...type.bodyStrong },
  item: { gap: space.xxs },
  where: { ...type.label, color: colors.inkMuted },
  message: { ...type.body, color: colors.ink },
});
