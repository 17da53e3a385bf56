import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { Button } from './button';

export type SaveCancelButtonsProps = {
  /** e.g. "Save design"; "Saving…" while the request is on its way. */
  label: string;
  pending: boolean;
  onSave: () => void;
  onCancel: () => void;
};

/** A form's save and cancel; neither can be pressed while saving. */
export function SaveCancelButtons({ label, pending, onSave, onCancel }: SaveCancelButtonsProps) {
  return (
    <View style={styles.buttons}>
      <Button label={pending ? 'Saving…' : label} onPress={onSave} disabled={pending} />
      <Button label="Cancel" variant="quiet" onPress={onCancel} disabled={pending} />
    </View>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', gap: spacing.md, flexWrap: 'wrap' },
});
