import { useState } from 'react';
import { can } from '../../../shared/domain/roles';
import { PageHeader } from '../../components/ui/page-header';
import { useMe } from '../../features/auth/api/me';
import { PanelLibrary } from '../../features/panels/components/panel-library';

/** /panels: the team's panel library. */
export function Component() {
  const { data: me } = useMe();
  // "5 minutes ago" is worked out against the moment the page opened.
  const [nowMs] = useState(() => Date.now());
  if (!me) return null;
  return (
    <>
      <PageHeader
        eyebrow={<>{me.team.name}</>}
        title="Panels"
        description="The operator’s touch panels: tiles on a grid, each bound to a channel the robot code reads."
      />
      <PanelLibrary canEdit={can(me.role, 'panels.edit')} canRun={can(me.role, 'panels.run')} nowMs={nowMs} />
    </>
  );
}
