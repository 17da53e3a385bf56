import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';

/** Printed with every sheet: the numbers are the model's, the grown piece is judged by measurement. */
export function SheetCaution() {
  return (
    <Notice tone="warning" title="Model predictions — verify by measurement" testID="sheet-caution">
      <AppText>
        Zone positions, target carrier concentrations, tolerance bands and the room-temperature Seebeck and conductivity values are computed from
        the leg model and the material family; they are not measurements. Check the grown piece by measurement before building a cooler from it.
      </AppText>
      <AppText>Follow your lab&apos;s safety rules and local codes: modules run at high currents and their hot side can burn.</AppText>
    </Notice>
  );
}
