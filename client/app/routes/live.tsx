import { AreaPlaceholder } from '../area-placeholder';
import { SafetyCaution } from '../safety-caution';

export function Component() {
  return (
    <AreaPlaceholder id="live">
      <SafetyCaution />
    </AreaPlaceholder>
  );
}
