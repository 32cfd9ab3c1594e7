import { Button } from '@mantine/core';

/** Shown while a list beside the video has been scrolled away from the playing moment. */
export function BackToNow({ onClick }: { onClick: () => void }) {
  return (
    <Button size="compact-xs" variant="light" onClick={onClick}>
      Back to now
    </Button>
  );
}
