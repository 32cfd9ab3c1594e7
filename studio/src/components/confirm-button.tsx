import { Button, Group, Modal, Stack, Text, type ButtonProps } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import type { ReactNode } from 'react';

export interface ConfirmButtonProps extends ButtonProps {
  /** What the person is about to do, as a question. */
  question: string;
  detail?: ReactNode;
  confirmLabel: string;
  onConfirm: () => void;
  children: ReactNode;
}

/** A button that asks before something that cannot be undone (removing a part, a feature, a reading). */
export function ConfirmButton({ question, detail, confirmLabel, onConfirm, children, ...buttonProps }: ConfirmButtonProps) {
  const [opened, { open, close }] = useDisclosure(false);
  return (
    <>
      <Button {...buttonProps} onClick={open}>
        {children}
      </Button>
      <Modal opened={opened} onClose={close} title={question} size="sm">
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
    </>
  );
}
