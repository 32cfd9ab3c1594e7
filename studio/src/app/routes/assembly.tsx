import { Stack, Tabs } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useParams, useSearchParams } from 'react-router-dom';
import { assemblyQueries } from '@/features/assemblies/api/queries';
import { AssemblyBuilder, AssemblyHeader } from '@/features/assemblies/components/assembly-builder';
import { buildQueries } from '@/features/builds/api/queries';
import { Checklist } from '@/features/fit-checks/components/checklist';
import { SubjectReadings } from '@/features/measurements/components/subject-readings';
import { WorkshopGate } from '@/features/workshops/components/workshop-gate';

type AssemblyTab = 'checklist' | 'build';

/** An assembly: its checklist, and the parts and interfaces it is built from (the tab is kept in the address). */
export function AssemblyRoute() {
  const { workshopId = '', assemblyId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const tab: AssemblyTab = params.get('tab') === 'build' ? 'build' : 'checklist';
  // The breadcrumb names the build: the assembly says which, the builds API says what it is called.
  const assembly = useQuery(assemblyQueries.detail(workshopId, assemblyId));
  const buildId = assembly.data?.buildId;
  const build = useQuery({ ...buildQueries.detail(workshopId, buildId ?? ''), enabled: buildId !== undefined });

  return (
    <WorkshopGate workshopId={workshopId}>
      {(workshop) => (
        <Stack gap="lg">
          <AssemblyHeader workshopId={workshopId} assemblyId={assemblyId} buildTitle={build.data?.title} />
          <Tabs
            value={tab}
            onChange={(value) => setParams(value === 'build' ? { tab: 'build' } : {}, { replace: true })}
            keepMounted={false}
          >
            <Tabs.List>
              <Tabs.Tab value="checklist">Checklist</Tabs.Tab>
              <Tabs.Tab value="build">Parts and interfaces</Tabs.Tab>
            </Tabs.List>
            <Tabs.Panel value="checklist" pt="md">
              <Checklist
                workshopId={workshopId}
                assemblyId={assemblyId}
                canRetryFitNews={workshop.role === 'owner' && !workshop.disabled}
              />
            </Tabs.Panel>
            <Tabs.Panel value="build" pt="md">
              <AssemblyBuilder
                workshopId={workshopId}
                assemblyId={assemblyId}
                renderInterfaceReadings={(assemblyInterface) => (
                  <SubjectReadings
                    workshopId={workshopId}
                    subject={{ interfaceId: assemblyInterface.id }}
                    defaultUnit={assemblyInterface.unit}
                    defaultQuantity="clearance"
                    label={`clearance across ${assemblyInterface.name}`}
                  />
                )}
              />
            </Tabs.Panel>
          </Tabs>
        </Stack>
      )}
    </WorkshopGate>
  );
}
