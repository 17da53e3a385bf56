import { fieldSentence } from '@/shared/api/field-labels';
import { ApiError } from '@/components/api/client';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';

/** A refused write: the API's message and, when it names fields, what is wrong with each. */
export function ErrorNotice({ title, error, testID }: { title: string; error: Error; testID?: string }) {
  const fields = error instanceof ApiError ? error.fieldErrors : [];
  return (
    <Notice tone="danger" title={title} testID={testID}>
      <AppText>{error.message}</AppText>
      {fields.map((f, i) => (
        <AppText key={i}>{fieldSentence(f.field, f.message)}</AppText>
      ))}
    </Notice>
  );
}
