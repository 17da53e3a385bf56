import { useLocalSearchParams, useRouter } from 'expo-router';
import type { FamilyDetailResponse } from '@/shared/api/families';
import { useFamilyDetail } from '@/components/api/families';
import { useUpdateFamily } from '@/components/api/family-mutations';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { FamilyWriteGuard } from '../write-guard';
import { Notice } from '@/components/ui/notice';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { valuesFromVersion, type ValidRequest } from './family-form-model';
import { FamilyForm } from './family-form';

function VersionNotice({ detail }: { detail: FamilyDetailResponse }) {
  const { version, runCount } = detail.current;
  const runs = runCount === 1 ? '1 run' : `${runCount} runs`;
  return (
    <Notice tone="info" title={`Saving creates version ${version + 1}`} testID="version-notice">
      <AppText>
        {`A change to the model, the source or the summary is saved as version ${version + 1}. Version ${version} stays exactly as it is${runCount > 0 ? `: it is locked, and the ${runs} that used it keep pointing at it` : ''}. Renaming alone does not make a new version.`}
      </AppText>
    </Notice>
  );
}

/** Edit a family: band models in full, measured and constant families by their texts. */
export function EditFamilyScreen() {
  const { id = '' } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const query = useFamilyDetail(id);
  const update = useUpdateFamily();
  const backToFamily = { label: 'Family', href: `/materials/${id}` } as const;
  if (!query.data) {
    return (
      <ScreenFrame title="Edit family" back={backToFamily}>
        {query.isError ? (
          <ErrorState title="Could not load the family" message={query.error.message} onRetry={() => void query.refetch()} />
        ) : (
          <LoadingState label="Loading the family…" />
        )}
      </ScreenFrame>
    );
  }
  const detail = query.data;
  const isBand = detail.current.definition.kind === 'band';
  const save = (request: ValidRequest) => {
    // Measured and constant families keep their stored definition untouched.
    const body = isBand ? request : { name: request.name, summary: request.summary, source: request.source };
    update.mutate({ id, body }, { onSuccess: () => router.dismissTo(`/materials/${id}`) });
  };
  return (
    <ScreenFrame
      title={`Edit ${detail.family.name}`}
      subtitle={isBand ? 'Band model, name and provenance' : 'Name and provenance; the measured values stay as uploaded'}
      back={{ ...backToFamily, label: detail.family.name }}
    >
      <FamilyWriteGuard>
        <FamilyForm
          initial={valuesFromVersion(detail.family.name, detail.current)}
          fixedDefinition={isBand ? undefined : detail.current.definition}
          submitLabel="Save changes"
          notice={<VersionNotice detail={detail} />}
          pending={update.isPending}
          error={update.error}
          onSubmit={save}
          onCancel={() => router.dismissTo(`/materials/${id}`)}
        />
      </FamilyWriteGuard>
    </ScreenFrame>
  );
}
