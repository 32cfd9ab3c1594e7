import { Alert } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { ErrorView } from '@/components/error-view';
import { PageLoader } from '@/components/page-loader';
import { ApiError } from '@/lib/api-client';
import { isWorkshopReadOnly, WorkshopAccessProvider } from '@/lib/workshop-access';
import { workshopQueries, type Workshop } from '../api/queries';

/**
 * Loads the workshop of the page. A workshop the caller is not a member of reads exactly like one
 * that does not exist (the API answers 404 for both).
 */
export function WorkshopGate({ workshopId, children }: { workshopId: string; children: (workshop: Workshop) => ReactNode }) {
  const workshop = useQuery(workshopQueries.detail(workshopId));
  if (workshop.isPending) return <PageLoader />;
  if (workshop.isError) {
    if (workshop.error instanceof ApiError && workshop.error.status === 404) {
      return <ErrorView title="Workshop not found" message="There is no workshop here that you are a member of." />;
    }
    return (
      <Alert color="red" title="Could not load the workshop">
        {workshop.error.message}
      </Alert>
    );
  }
  return (
    <WorkshopAccessProvider readOnly={isWorkshopReadOnly(workshop.data)}>
      {workshop.data.role === 'admin' && (
        <Alert color="blue" mb="md" title="Reading as a site administrator">
          You are not a member of this workshop, so you can read it but not change it.
        </Alert>
      )}
      {workshop.data.disabled && (
        <Alert color="yellow" mb="md" title="This workshop is disabled">
          The site administrators have disabled this workshop. You can read it, but nothing can be changed.
        </Alert>
      )}
      {children(workshop.data)}
    </WorkshopAccessProvider>
  );
}
