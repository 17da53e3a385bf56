import { useRouter } from 'expo-router';
import { useCreateDesign } from '@/components/api/designs';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { emptyDesignValues } from './design-form-model';
import { DesignForm } from './design-form';
import { DesignWriteGuard } from './design-write-guard';

/** A new leg design; on success, its page (where runs are launched). */
export function NewDesignScreen() {
  const router = useRouter();
  const create = useCreateDesign();
  return (
    <ScreenFrame
      title="New design"
      subtitle="One leg: material, shape, operating point and what the grower can make. Estimate it here; launch runs from its page."
      back={{ label: 'Designs', href: '/designs' }}
    >
      <DesignWriteGuard>
        <DesignForm
          initial={emptyDesignValues()}
          submitLabel="Save design"
          pending={create.isPending}
          error={create.error}
          onSubmit={(input) => create.mutate(input, { onSuccess: ({ design }) => router.replace(`/designs/${design.id}`) })}
          onCancel={() => router.dismissTo('/designs')}
        />
      </DesignWriteGuard>
    </ScreenFrame>
  );
}
