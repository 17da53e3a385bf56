import { useState } from 'react';
import { router } from 'expo-router';
import type { Cooler } from '@/shared/api/coolers';
import { useDeleteCooler } from '@/components/api/coolers';
import { useRole } from '@/components/auth/session';
import { ConfirmBox } from '@/components/ui/confirm-box';
import { Notice } from '@/components/ui/notice';
import { RowButton } from '@/components/ui/row-button';
import { AppText } from '@/components/ui/text';
import { coolerKindLabel } from './cooler-format';

/**
 * "Delete", then a second, explicit step naming what goes with it; admins
 * only, as the server rules. Its finished runs are deleted too (they make no
 * sense without the setup they ran), so the question says how many.
 */
export function DeleteCooler({ cooler, finishedRuns }: { cooler: Cooler; finishedRuns: number }) {
  const { can } = useRole();
  const [asking, setAsking] = useState(false);
  const remove = useDeleteCooler();
  if (!can('records.delete')) return null;
  const what = coolerKindLabel[cooler.kind].toLowerCase();
  if (!asking) return <RowButton label={`Delete this ${what}`} onPress={() => setAsking(true)} testID="cooler-delete" />;
  return (
    <>
      <ConfirmBox
        question={`Delete the ${what} “${cooler.name}”?`}
        consequence={`Its setup and its ${finishedRuns} finished run${finishedRuns === 1 ? '' : 's'} go for everyone in the team. The leg runs and families it was built from stay.`}
        confirmLabel={`Delete ${what}`}
        busyLabel="Deleting…"
        busy={remove.isPending}
        onConfirm={() => remove.mutate(cooler.id, { onSuccess: () => router.replace('/stages') })}
        onCancel={() => setAsking(false)}
        testID="confirm-delete-cooler"
      />
      {remove.isError ? (
        <Notice tone="danger" title="Not deleted" testID="cooler-delete-error">
          <AppText>{remove.error.message}</AppText>
        </Notice>
      ) : null}
    </>
  );
}
