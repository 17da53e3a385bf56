import { useLocalSearchParams, useRouter } from 'expo-router';
import { useDesign, useUpdateDesign } from '@/components/api/designs';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { Notice } from '@/components/ui/notice';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { valuesFromDesign } from './design-form-model';
import { DesignForm } from './design-form';
import { DesignWriteGuard } from './design-write-guard';

/** `/designs/[id]/edit`: runs already launched keep their frozen copy. */
export function EditDesignScreen() {
  const router = useRouter();
  const id = useLocalSearchParams<{ id: string }>().id ?? '';
  const query = useDesign(id);
  const update = useUpdateDesign();
  const page = `/designs/${id}` as const;
  const design = query.data?.design;
  return (
    <ScreenFrame title={design ? `Edit ${design.name}` : 'Edit design'} back={{ label: design?.name ?? 'Design', href: page }}>
      <DesignWriteGuard>
        {query.isPending ? <LoadingState label="Loading the design…" /> : null}
        {query.isError ? <ErrorState title="Could not load the design" message={query.error.message} /> : null}
        {design ? (
          <>
            <Notice tone="info" title="Runs keep what they ran">
              <AppText>Every run froze a copy of the design and family version when it was launched; changing the design affects only new runs.</AppText>
            </Notice>
            <DesignForm
              initial={valuesFromDesign(design)}
              submitLabel="Save changes"
              pending={update.isPending}
              error={update.error}
              onSubmit={(body) => update.mutate({ id, body }, { onSuccess: () => router.dismissTo(page) })}
              onCancel={() => router.dismissTo(page)}
            />
          </>
        ) : null}
      </DesignWriteGuard>
    </ScreenFrame>
  );
}
