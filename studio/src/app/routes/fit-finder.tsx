import { FitFinderPage } from '@/features/fit-finder/components/fit-finder-page';

/** The public fit finder: across every published guide, for anyone. */
export function FitFinderRoute() {
  return <FitFinderPage />;
}
