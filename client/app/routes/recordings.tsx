import { AreaPlaceholder } from '../area-placeholder';

export function Component() {
  return <AreaPlaceholder id="recordings" />;
}
