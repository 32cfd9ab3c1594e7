import { FitFinderPage } from '@/features/fit-finder/components/fit-finder-page';
import { useReleasePageShell } from '@/lib/page-shell';

/** The public fit finder: across every published guide, for anyone. */
export function FitFinderRoute() {
  // The server's static first paint (title and the lead sentence) gives way as soon as the page itself draws.
  useReleasePageShell(true);
  return <FitFinderPage />;
}
