import { Button, Group, Modal, Stack, Text, type ButtonProps } from '@mantine/core';
import { useRef, useState, type ReactNode } from 'react';

export interface ConfirmButtonProps extends ButtonProps {
  /** What the person is about to do, as a question. */
  question: string;
  detail?: ReactNode;
  confirmLabel: string;
  onConfirm: () => void;
  children: ReactNode;
}

/**
 * A button that asks before something that cannot be undone (removing a part, a feature, a reading). The dialog is
 * only in the page from the press until it has faded out: a closed Mantine modal still puts its portal, its scroll
 * lock and a window key listener in the page, and long lists (400 marks, 40 steps) carry one per row.
 */
export function ConfirmButton({ question, detail, confirmLabel, onConfirm, children, ...buttonProps }: ConfirmButtonProps) {
  const [opened, setOpened] = useState(false);
  const [mounted, setMounted] = useState(false);
  const button = useRef<HTMLButtonElement>(null);
  const close = () => setOpened(false);
  // A modal mounted open never saw focus arrive, so it cannot hand it back: the button takes it back itself.
  const closed = () => {
    setMounted(false);
    const active = document.activeElement;
    if (active === null || active === document.body || active.closest('[data-portal]')) button.current?.focus({ preventScroll: true });
  };
  return (
    <>
      <Button
        {...buttonProps}
        ref={button}
        onClick={() => {
          setMounted(true);
          setOpened(true);
        }}
      >
        {children}
      </Button>
      {mounted && (
        <Modal opened={opened} onClose={close} onExitTransitionEnd={closed} returnFocus={false} title={question} size="sm">
          <Stack>
            {detail && <Text size="sm">{detail}</Text>}
            <Group justify="flex-end">
              <Button variant="default" onClick={close}>
                Keep it
              </Button>
              <Button
                color="red"
                onClick={() => {
                  close();
                  onConfirm();
                }}
              >
                {confirmLabel}
              </Button>
            </Group>
          </Stack>
        </Modal>
      )}
    </>
  );
}
