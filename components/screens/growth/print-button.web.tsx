import { Button } from '@/components/ui/button';

/** Browsers: the system print dialog (to paper or PDF), with the sheet's print stylesheet. */
export function PrintButton({ label = 'Print sheet' }: { label?: string }) {
  return <Button label={label} onPress={() => window.print()} />;
}
