import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';

/** Beside every number that someone might build hardware from. */
export function CautionNotice({ testID = 'caution' }: { testID?: string }) {
  return (
    <Notice tone="warning" title="Model prediction — measure before you build" testID={testID}>
      <AppText>
        These numbers come from the leg model and the material family, not from a measurement. Grow and measure a leg before relying on them.
      </AppText>
      <AppText>
        Peltier modules run at high currents and their hot side can burn: follow your lab&apos;s safety rules and local electrical codes when you test one.
      </AppText>
    </Notice>
  );
}
