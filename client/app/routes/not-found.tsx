import { ButtonLink } from '../../components/ui/button-link';
import { EmptyState } from '../../components/ui/empty-state';
import { PageHeader } from '../../components/ui/page-header';

export function Component() {
  return (
    <>
      <PageHeader title="Page not found" />
      <EmptyState icon="home" title="There’s nothing at this address" action={<ButtonLink to="/">Back to team home</ButtonLink>}>
        The link may be old, or the page may have moved.
      </EmptyState>
    </>
  );
}
