import { Anchor, Group, Image, Modal, Stack, UnstyledButton } from '@mantine/core';
import { useState } from 'react';
import type { FitReportPhoto } from '../api/queries';

/** A report's photos as thumbnails; a click (or Enter) opens one large. */
export function ReportPhotos({ photos, reporter }: { photos: FitReportPhoto[]; reporter: string }) {
  const [openIndex, setOpenIndex] = useState<number | null>(null);
  if (photos.length === 0) return null;
  const describe = (index: number) => `Photo ${index + 1} of ${photos.length} from ${reporter}`;
  const open = openIndex === null ? null : photos[openIndex];
  return (
    <>
      <Group gap="xs" component="ul" aria-label="Photos" style={{ listStyle: 'none', margin: 0, padding: 0 }}>
        {photos.map((photo, index) => (
          <li key={photo.id}>
            <UnstyledButton
              onClick={() => setOpenIndex(index)}
              aria-label={`Enlarge photo ${index + 1} of ${photos.length}`}
              data-testid="report-photo"
              style={{ borderRadius: 4, overflow: 'hidden', border: '1px solid var(--mantine-color-gray-4)' }}
            >
              <Image src={photo.url} alt={describe(index)} w={88} h={88} fit="cover" loading="lazy" />
            </UnstyledButton>
          </li>
        ))}
      </Group>
      <Modal opened={open !== null} onClose={() => setOpenIndex(null)} title={openIndex === null ? '' : describe(openIndex)} size="xl" centered>
        {open && (
          <Stack gap="xs">
            <Image src={open.url} alt={describe(openIndex ?? 0)} fit="contain" mah="75vh" data-testid="enlarged-photo" />
            <Anchor href={open.url} target="_blank" rel="noreferrer" size="xs" ta="center">
              Open the full-size photo in a new tab
            </Anchor>
          </Stack>
        )}
      </Modal>
    </>
  );
}
