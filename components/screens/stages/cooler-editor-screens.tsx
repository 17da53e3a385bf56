import { router, useLocalSearchParams } from 'expo-router';
import type { Cooler } from '@/shared/api/coolers';
import { useCooler } from '@/components/api/coolers';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { CascadeEditor } from './cascade-editor';
import { cascadeTextFrom, defaultCascadeText } from './cascade-form-model';
import { coolerKindLabel } from './cooler-format';
import type { SavedTo } from './cooler-save';
import { CoupleEditor } from './couple-editor';
import { coupleTextFrom, defaultCoupleText } from './couple-form-model';

const back = { label: 'Stages', href: '/stages' } as const;

/** After saving: to the run just launched, or to the cooler's page. */
function goTo({ cooler, launchedRunId }: SavedTo) {
  router.replace(launchedRunId ? `/runs/${launchedRunId}` : `/stages/${cooler.id}`);
}

/** The editor for a saved cooler's kind, filled from its setup; `asNew` keeps the setup but not the name (a copy). */
function EditorFor({ cooler, asNew }: { cooler: Cooler; asNew: boolean }) {
  const i = cooler.input;
  const savedId = asNew ? null : cooler.id;
  if (i.kind === 'cascade') return <CascadeEditor initial={{ ...cascadeTextFrom(i), name: asNew ? '' : i.name }} savedId={savedId} onSaved={goTo} />;
  return <CoupleEditor initial={{ ...coupleTextFrom(i), name: asNew ? '' : i.name }} savedId={savedId} onSaved={goTo} />;
}

function FromSaved({ id, asNew }: { id: string; asNew: boolean }) {
  const query = useCooler(id);
  if (query.data) return <EditorFor cooler={query.data.cooler} asNew={asNew} />;
  return query.isError ? <ErrorState title="Could not load the setup" message={query.error.message} /> : <LoadingState label="Loading the setup…" />;
}

/** `/stages/new-cascade?from=<id>`: a new cascade, blank or a copy of a saved one. */
export function NewCascadeScreen() {
  const from = useLocalSearchParams<{ from?: string }>().from ?? '';
  return (
    <ScreenFrame title="New cascade" subtitle="Stages of couples, the coldest first, on one heat sink" back={back}>
      {from ? <FromSaved id={from} asNew /> : <CascadeEditor initial={defaultCascadeText()} savedId={null} onSaved={goTo} />}
    </ScreenFrame>
  );
}

/** `/stages/new-couple`: a p and an n leg optimised together on one current. */
export function NewCoupleScreen() {
  return (
    <ScreenFrame title="New matched couple" subtitle="A p and an n leg on one current, the area ratio free" back={back}>
      <CoupleEditor initial={defaultCoupleText()} savedId={null} onSaved={goTo} />
    </ScreenFrame>
  );
}

/** `/stages/[id]/edit`: change a saved setup (its runs keep what they ran). */
export function EditCoolerScreen() {
  const id = useLocalSearchParams<{ id: string }>().id ?? '';
  const query = useCooler(id);
  const c = query.data?.cooler;
  return (
    <ScreenFrame title={c ? `Edit ${c.name}` : 'Edit'} subtitle={c ? `${coolerKindLabel[c.kind]}: runs already made keep the setup they ran` : undefined} back={{ label: c?.name ?? 'Back', href: `/stages/${id}` }}>
      {c ? <EditorFor key={c.updatedAt} cooler={c} asNew={false} /> : query.isError ? <ErrorState title="Could not load the setup" message={query.error.message} /> : <LoadingState label="Loading the setup…" />}
    </ScreenFrame>
  );
}
