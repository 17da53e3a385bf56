import { useRouter } from 'expo-router';
import { useCreateFamily } from '@/components/api/family-mutations';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { FamilyWriteGuard } from '../write-guard';
import { emptyBandValues } from './family-form-model';
import { FamilyForm } from './family-form';

/** A new band-model family; on success, its page. */
export function NewFamilyScreen() {
  const router = useRouter();
  const create = useCreateFamily();
  return (
    <ScreenFrame
      title="New band-model family"
      subtitle="Describe the material by its band: the app derives S, σ and κ at any doping and temperature."
      back={{ label: 'Materials', href: '/materials' }}
    >
      <FamilyWriteGuard>
        <FamilyForm
          initial={emptyBandValues()}
          submitLabel="Create family"
          pending={create.isPending}
          error={create.error}
          onSubmit={(request) =>
            create.mutate(request, { onSuccess: ({ family }) => router.replace(`/materials/${family.id}`) })
          }
          onCancel={() => router.dismissTo('/')}
        />
      </FamilyWriteGuard>
    </ScreenFrame>
  );
}
