// Choose the MOP document (PDF or text) with the system picker; refuses wrong types and oversized files at once.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import * as DocumentPicker from 'expo-document-picker';
import { Button } from '@/components/button';
import { formatBytes, MOP_MAX_BYTES, MOP_MIME_TYPES, mopMime, mopProblem, type MopFile } from '@/components/windows/mop-file';
import { colors, space, type } from '@/constants/theme';

type Props = {
  file: MopFile | null;
  onChange: (file: MopFile | null) => void;
  /** Name of the document already stored with the window, when editing. */
  storedName?: string | null;
  error?: string;
  disabled?: boolean;
};

export function MopPicker({ file, onChange, storedName, error, disabled = false }: Props) {
  const [problem, setProblem] = useState<string | null>(null);
  const choose = async () => {
    const result = await DocumentPicker.getDocumentAsync({ type: [...MOP_MIME_TYPES], multiple: false, base64: false });
    if (result.canceled || !result.assets?.[0]) return;
    const asset = result.assets[0];
    const mime = mopMime(asset.name, asset.mimeType);
    const sizeBytes = asset.size ?? asset.file?.size ?? 0;
    const found = mopProblem({ name: asset.name, sizeBytes, mime });
    setProblem(found);
    if (found || !mime) return;
    onChange({ name: asset.name, sizeBytes, mime, uri: asset.uri, blob: asset.file });
  };
  const shown = problem ?? error;
  return (
    <View style={styles.box}>
      <Text style={styles.label}>Method of procedure (MOP)</Text>
      <Text style={styles.muted}>
        {file
          ? `Will attach ${file.name} (${formatBytes(file.sizeBytes)}).`
          : storedName
            ? `Attached: ${storedName}. Choose a file to replace it.`
            : `PDF or plain text, up to ${formatBytes(MOP_MAX_BYTES)}.`}
      </Text>
      <View style={styles.actions}>
        <Button label={file || storedName ? 'Choose another file' : 'Choose file'} variant="quiet" onPress={() => void choose()} disabled={disabled} testID="window-mop-choose" />
        {file ? <Button label="Don't attach" variant="quiet" onPress={() => onChange(null)} disabled={disabled} /> : null}
      </View>
      {shown ? <Text style={styles.error} role="alert" testID="window-mop-error">{shown}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  error: { ...type.caption, color: colors.danger },
});
