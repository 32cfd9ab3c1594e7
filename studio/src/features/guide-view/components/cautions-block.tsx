import { Paper, Stack, Text, Title } from '@mantine/core';
import type { PublishedGuide } from '../api/types';
import { CautionPanel } from './caution-panel';
import { orderedCautions } from './cautions';
import classes from './guide-view.module.css';

/** At the top of a guide: every caution, most severe first, and the disclaimer, which is always shown. */
export function CautionsBlock({ guide }: { guide: Pick<PublishedGuide, 'cautions' | 'steps' | 'disclaimer'> }) {
  const cautions = orderedCautions(guide);
  return (
    <Stack gap="sm" component="section" aria-labelledby="guide-safety-heading" data-testid="cautions-block">
      <Title order={2} size="h4" id="guide-safety-heading">
        Safety before you start
      </Title>
      {cautions.map((caution) => (
        <CautionPanel key={caution.key} level={caution.level} text={caution.text} source={caution.source} />
      ))}
      <Paper withBorder p="sm" className={classes.disclaimer} data-testid="disclaimer">
        <Text size="sm">{guide.disclaimer}</Text>
      </Paper>
    </Stack>
  );
}
