import { ErrorView } from '@/components/error-view';

export function NotFoundRoute() {
  return <ErrorView title="Page not found" message="There is nothing at this address. Check the link, or start again from the start page." />;
}
