import type { ReactNode } from 'react';
import { can } from '../../shared/domain/roles';
import { Badge } from '../components/ui/badge';
import { Icon } from '../components/ui/icon';
import { PageHeader } from '../components/ui/page-header';
import { useMe } from '../features/auth/api/me';
import { areaById, type AreaId } from './areas';

/** The honest state of an area that isn't built yet: what it will do, for whom, and for you. */
export function AreaPlaceholder({ id, children }: { id: AreaId; children?: ReactNode }) {
  const area = areaById(id);
  const me = useMe();
  const role = me.data?.role;
  return (
    <>
      <PageHeader eyebrow={<>Coming in a later release</>} title={area.label} description={area.tagline} />
      <div className="flex flex-col gap-5">
        {children}
        <section
          aria-label={`About ${area.label}`}
          className="grid gap-6 rounded-xl bg-asphalt-850 p-6 ring-1 ring-asphalt-750 lg:grid-cols-[1fr_18rem]"
        >
          <div>
            <div className="mb-4 flex items-center gap-3">
              <span className="grid size-11 place-items-center rounded-lg bg-signal-950 text-signal-400 ring-1 ring-signal-500/40">
                <Icon name={area.icon} />
              </span>
              <Badge tone="neutral">Not available yet</Badge>
            </div>
            <h2 className="text-lg font-semibold text-asphalt-100">What this area will do</h2>
            <p className="mt-2 max-w-prose text-[0.9375rem] leading-relaxed text-asphalt-300">{area.description}</p>
          </div>
          <dl className="flex flex-col gap-4 border-asphalt-700 text-[0.9375rem] lg:border-l lg:pl-6">
            <div>
              <dt className="text-xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">Who uses it</dt>
              <dd className="mt-1 text-asphalt-200">{area.usedBy}</dd>
            </div>
            {role && (
              <div>
                <dt className="text-xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">With your role</dt>
                <dd className="mt-1 text-asphalt-200">{can(role, area.action) ? area.canLine : area.cannotLine}</dd>
              </div>
            )}
          </dl>
        </section>
      </div>
    </>
  );
}
