import { notifications } from '@mantine/notifications';

/** A failed action told in words where the person is looking; the API's message is already a sentence. */
export function notifyError(title: string, error: unknown): void {
  notifications.show({
    color: 'red',
    title,
    message: error instanceof Error ? error.message : 'Something went wrong.',
    autoClose: 8000,
  });
}

export function notifyDone(message: string): void {
  notifications.show({ color: 'patina', message, autoClose: 4000 });
}
