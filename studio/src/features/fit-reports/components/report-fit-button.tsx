import { Button, Group, Loader, Modal, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { lazy, Suspense } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { signInPathFor } from '@/components/route-guards';
import { useSession } from '@/lib/session';

// The form (with its photo drop zone) loads when a reader opens it, so the guide's readers never download it.
const FitReportForm = lazy(async () => ({ default: (await import('./fit-report-form')).FitReportForm }));

export interface ReportFitButtonProps {
  workshopSlug: string;
  guideSlug: string;
  guideTitle: string;
}

const EXPLANATION = 'Tried a combination of parts? Tell the workshop whether it fit.';

/** On a published guide: opens the fit-report form, or offers to sign in and come back here (`?next=`). */
export function ReportFitButton({ workshopSlug, guideSlug, guideTitle }: ReportFitButtonProps) {
  const { user, isPending } = useSession();
  const location = useLocation();
  const [opened, { open, close }] = useDisclosure(false);
  if (isPending) return null;
  if (!user) {
    return (
      <Group gap="sm" data-testid="report-fit">
        <Button component={Link} to={signInPathFor(location)} variant="light" size="xs">
          Sign in to report a fit
        </Button>
        <Text size="sm" c="dimmed">
          {EXPLANATION}
        </Text>
      </Group>
    );
  }
  return (
    <Group gap="sm" data-testid="report-fit">
      <Button variant="default" size="xs" onClick={open}>
        Report a fit
      </Button>
      <Text size="sm" c="dimmed">
        {EXPLANATION}
      </Text>
      {/* A stray click beside the form must not throw away what was typed. */}
      <Modal opened={opened} onClose={close} title={`Report a fit: ${guideTitle}`} size="lg" closeOnClickOutside={false}>
        <Suspense fallback={<Loader size="sm" aria-label="Loading the form" />}>
          <FitReportForm workshopSlug={workshopSlug} guideSlug={guideSlug} emailVerified={user.emailVerified} onClose={close} />
        </Suspense>
      </Modal>
    </Group>
  );
}
