import { Paper, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';

/** The frame of every sign-in style page: a narrow card with a title and a line of help. */
export function AuthCard({ title, subtitle, children }: { title: string; subtitle?: ReactNode; children: ReactNode }) {
  return (
    <Paper withBorder radius="md" p="xl" maw={440} mx="auto" mt="xl">
      <Stack gap="md">
        <div>
          <Title order={2}>{title}</Title>
          {subtitle && (
            <Text c="dimmed" size="sm" mt={4}>
              {subtitle}
            </Text>
          )}
        </div>
        {children}
      </Stack>
    </Paper>
  );
}
