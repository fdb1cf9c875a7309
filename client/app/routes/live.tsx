import { useMe } from '../../features/auth/api/me';
import { LivePage } from '../../features/live/components/live-page';
import { SafetyCaution } from '../safety-caution';

export function Component() {
  const me = useMe();
  // The app frame renders routes only once the member is loaded.
  if (!me.data) return null;
  return <LivePage memberRole={me.data.role} safety={<SafetyCaution />} />;
}
