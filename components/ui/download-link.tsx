import { Linking, Pressable } from 'react-native';
import { downloadLinkStyles as styles } from './download-link-styles';
import { AppText } from './text';

export type DownloadLinkProps = { label: string; url: string; testID?: string };

/** Devices: hand the file's address to the system (browser or share sheet). See .web.tsx. */
export function DownloadLink({ label, url, testID }: DownloadLinkProps) {
  return (
    <Pressable
      accessibilityRole="link"
      testID={testID}
      onPress={() => void Linking.openURL(url)}
      style={({ pressed }) => [styles.link, pressed && styles.pressed]}
    >
      <AppText variant="label" tone="primary">
        {label}
      </AppText>
    </Pressable>
  );
}
