import { Center, Loader } from '@mantine/core';

export function PageLoader() {
  return (
    <Center h={200} aria-label="Loading">
      <Loader />
    </Center>
  );
}
