import { Button, Group, Modal, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { Link, useLocation } from 'react-router-dom';
import { signInPathFor } from '@/components/route-guards';
import { useSession } from '@/lib/session';
import { FitReportForm } from './fit-report-form';

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
        <FitReportForm workshopSlug={workshopSlug} guideSlug={guideSlug} emailVerified={user.emailVerified} onClose={close} />
      </Modal>
    </Group>
  );
}
