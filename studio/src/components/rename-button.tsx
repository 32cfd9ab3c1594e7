import { Button, Group, Modal, Stack, TextInput, type ButtonProps } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';

export interface RenameButtonProps extends ButtonProps {
  /** "build", "assembly", "footage". */
  what: string;
  /** The field's label: "Title", "Name". */
  label: string;
  current: string;
  maxLength: number;
  /** Saves; a rejection keeps the dialog open with the message under the field. */
  onRename: (name: string) => Promise<unknown>;
}

/** Rename in a small dialog: the current name to edit, checked before asking, the server's refusal under the field. */
export function RenameButton({ what, label, current, maxLength, onRename, ...buttonProps }: RenameButtonProps) {
  const [opened, { open, close }] = useDisclosure(false);
  const [value, setValue] = useState(current);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const start = () => {
    setValue(current);
    setError(null);
    open();
  };

  const save = async () => {
    const name = value.trim();
    if (!name) return setError(`Give the ${what} a ${label.toLowerCase()}`);
    if (name.length > maxLength) return setError(`Keep it under ${maxLength} characters`);
    if (name === current) return close();
    setBusy(true);
    try {
      await onRename(name);
      close();
    } catch (failure) {
      setError(failure instanceof Error ? failure.message : String(failure));
    } finally {
      setBusy(false);
    }
  };

  return (
    <>
      <Button variant="subtle" {...buttonProps} onClick={start}>
        Rename
      </Button>
      <Modal opened={opened} onClose={close} title={`Rename the ${what}`} size="sm">
        <form
          onSubmit={(event) => {
            event.preventDefault();
            void save();
          }}
          aria-label={`Rename the ${what}`}
        >
          <Stack gap="sm">
            <TextInput label={label} value={value} onChange={(event) => setValue(event.currentTarget.value)} error={error} data-autofocus />
            <Group justify="flex-end">
              <Button variant="default" onClick={close}>
                Cancel
              </Button>
              <Button type="submit" loading={busy}>
                Save
              </Button>
            </Group>
          </Stack>
        </form>
      </Modal>
    </>
  );
}
