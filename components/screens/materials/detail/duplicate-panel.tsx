import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { ApiError } from '@/components/api/client';
import { useDuplicateFamily } from '@/components/api/family-mutations';
import { colors, radii, spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

export type DuplicatePanelProps = { familyId: string; familyName: string; onClose: () => void };

/** Name the copy, make it, open it. */
export function DuplicatePanel({ familyId, familyName, onClose }: DuplicatePanelProps) {
  const router = useRouter();
  const duplicate = useDuplicateFamily();
  const [name, setName] = useState(`${familyName} (copy)`);
  const [missing, setMissing] = useState(false);
  const error = duplicate.error;
  const nameError = error instanceof ApiError ? error.fieldErrors.find((e) => e.field === 'name')?.message : undefined;
  const submit = () => {
    if (name.trim() === '') {
      setMissing(true);
      return;
    }
    duplicate.mutate({ id: familyId, name: name.trim() }, { onSuccess: ({ family }) => router.push(`/materials/${family.id}`) });
  };
  return (
    <View style={styles.panel} testID="duplicate-panel">
      <TextField
        id="duplicate-name"
        label="Name of the copy"
        help="The copy starts at version 1 with this version's model and provenance."
        value={name}
        onChangeText={(text) => {
          setName(text);
          setMissing(false);
        }}
        error={missing ? 'Name is required' : (nameError ?? (error && !nameError ? error.message : undefined))}
      />
      <View style={styles.buttons}>
        <Button label={duplicate.isPending ? 'Duplicating…' : 'Make the copy'} onPress={submit} disabled={duplicate.isPending} />
        <Button label="Cancel" variant="quiet" onPress={onClose} disabled={duplicate.isPending} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    gap: spacing.md,
    padding: spacing.md,
    borderRadius: radii.md,
    backgroundColor: colors.background,
    borderWidth: 1,
    borderColor: colors.border,
  },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
