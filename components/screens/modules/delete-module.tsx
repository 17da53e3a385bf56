import { useState } from 'react';
import { router } from 'expo-router';
import type { ModuleDesign } from '@/shared/api/modules';
import { useRole } from '@/components/auth/session';
import { useDeleteModule } from '@/components/api/modules';
import { ConfirmBox } from '@/components/ui/confirm-box';
import { Notice } from '@/components/ui/notice';
import { RowButton } from '@/components/ui/row-button';
import { AppText } from '@/components/ui/text';

/** "Delete module", then a second, explicit step; back to the list once it is gone. Physicists and admins only. */
export function DeleteModule({ module }: { module: ModuleDesign }) {
  const { can } = useRole();
  const [asking, setAsking] = useState(false);
  const remove = useDeleteModule();
  if (!can('designs.write')) return null;
  if (!asking) return <RowButton label="Delete module" onPress={() => setAsking(true)} testID="module-delete" />;
  return (
    <>
      <ConfirmBox
        question={`Delete the module “${module.name}”?`}
        consequence="The saved settings go for everyone in the team. The runs and families it was built from stay."
        confirmLabel="Delete module"
        busyLabel="Deleting…"
        busy={remove.isPending}
        onConfirm={() => remove.mutate(module.id, { onSuccess: () => router.replace('/modules') })}
        onCancel={() => setAsking(false)}
        testID="confirm-delete-module"
      />
      {remove.isError ? (
        <Notice tone="danger" title="Not deleted" testID="module-delete-error">
          <AppText>{remove.error.message}</AppText>
        </Notice>
      ) : null}
    </>
  );
}
