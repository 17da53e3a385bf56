import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/shell/use-is-wide';
import { InviteForm } from './invite-form';
import { RowButton } from '@/components/ui/row-button';
import { Section as TeamSection } from '@/components/ui/form-section';

/**
 * Admins: the invitation form. Open on a wide screen; on a phone it waits
 * behind one button so the members stay on the first screen.
 */
export function InviteSection() {
  const wide = useIsWide();
  const [open, setOpen] = useState(wide);
  return (
    <TeamSection title="Invite a teammate" hint="They get an e-mail with a link to choose their name and password.">
      {open ? (
        <InviteForm />
      ) : (
        <View style={styles.row}>
          <RowButton label="Write an invitation" tone="primary" onPress={() => setOpen(true)} testID="open-invite" />
        </View>
      )}
    </TeamSection>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row' },
});
