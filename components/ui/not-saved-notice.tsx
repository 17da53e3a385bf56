import { Notice } from './notice';
import { AppText } from './text';

export type NotSavedNoticeProps = {
  /** What the API said, for people. */
  message: string;
  /** Problems the form has no field for, each on its own line (e.g. "definition: …"). */
  details?: readonly string[];
  testID?: string;
};

/** "Not saved": why a save failed, under the form's fields. */
export function NotSavedNotice({ message, details = [], testID }: NotSavedNoticeProps) {
  return (
    <Notice tone="danger" title="Not saved" testID={testID}>
      <AppText>{message}</AppText>
      {details.map((line) => (
        <AppText key={line} variant="mono">
          {line}
        </AppText>
      ))}
    </Notice>
  );
}
