import { useServerConfig } from '../features/dev-inbox/api/server-config';
import { TextLink } from './text-link';

/** On a server without real e-mail, points to where its mails land. Renders nothing otherwise. */
export function DevInboxHint({ children = 'Open the dev inbox' }: { children?: string }) {
  const config = useServerConfig();
  if (!config.data?.devInbox) return null;
  return <TextLink to="/dev/inbox">{children}</TextLink>;
}
