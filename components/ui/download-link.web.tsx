import { Text } from 'react-native';
import { downloadLinkStyles as styles } from './download-link-styles';
import { AppText } from './text';

export type DownloadLinkProps = { label: string; url: string; testID?: string };

/** react-native-web renders `href` as an anchor; `hrefAttrs` adds `download`. */
type WebAnchorProps = { href: string; hrefAttrs: { download: string; rel: string } };

/**
 * Browsers: a plain `<a href download>`; the server answers with
 * Content-Disposition: attachment, so the file is saved, not navigated to.
 */
export function DownloadLink({ label, url, testID }: DownloadLinkProps) {
  const anchor: WebAnchorProps = { href: url, hrefAttrs: { download: '', rel: 'noopener' } };
  return (
    <Text {...anchor} role="link" testID={testID} style={styles.link}>
      <AppText variant="label" tone="primary">
        {label}
      </AppText>
    </Text>
  );
}
