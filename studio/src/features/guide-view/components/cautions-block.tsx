import { Stack, Text, Title } from '@mantine/core';
import type { PublishedGuide } from '../api/types';
import { CautionPanel, FoldedCaution } from './caution-panel';
import { orderedCautions } from './cautions';
import classes from './guide-view.module.css';

/**
 * At the top of a guide, before any step: every caution, most severe first. The most severe level is shown
 * in full; the others fold to their signal-word line (one per topic or step) so the video stays on the first
 * screen. The disclaimer is always shown.
 */
export function CautionsBlock({ guide }: { guide: Pick<PublishedGuide, 'cautions' | 'steps' | 'disclaimer'> }) {
  const cautions = orderedCautions(guide);
  const mostSevere = cautions[0]?.level;
  const inFull = cautions.filter((caution) => caution.level === mostSevere);
  const folded = cautions.filter((caution) => caution.level !== mostSevere);
  return (
    <Stack gap={6} component="section" aria-labelledby="guide-safety-heading" data-testid="cautions-block" className={classes.cautionsBlock}>
      <Title order={2} size="h5" id="guide-safety-heading" className={classes.keepWithNext}>
        Safety before you start
      </Title>
      {inFull.map((caution) => (
        <CautionPanel key={caution.key} level={caution.level} text={caution.text} source={caution.source} compact />
      ))}
      {folded.length > 0 && (
        <ul className={classes.foldedCautions} aria-label="More cautions: open one to read it">
          {folded.map((caution) => (
            <li key={caution.key}>
              <FoldedCaution level={caution.level} text={caution.text} source={caution.source} />
            </li>
          ))}
        </ul>
      )}
      <Text size="xs" className={classes.disclaimer} data-testid="disclaimer">
        {guide.disclaimer}
      </Text>
    </Stack>
  );
}
