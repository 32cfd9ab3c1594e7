import { SearchPage } from '@/features/search/components/search-page';

export function SearchRoute() {
  return <SearchPage />;
}
