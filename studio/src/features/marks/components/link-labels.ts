import { paths } from '@/config/paths';
import type { GuideStepChoice, LinkAssembly, Mark, MeasurementChoice, PartChoice } from '../api/queries';
import { formatClock } from '@/lib/clock';
import { CHECK_STATE_WORDS, LINK_OF_KIND } from './mark-kinds';

/** Everything a mark can point at, as far as it has been loaded (undefined while a list is not). */
export interface LinkSources {
  parts?: PartChoice[];
  measurements?: MeasurementChoice[];
  assemblies?: LinkAssembly[];
  guideSteps?: { inFootage: GuideStepChoice[]; others: GuideStepChoice[] };
}

/** What a mark's link reads as in the list, and the page that shows it (null when the studio has none). */
export interface LinkDescription {
  name: string;
  to: string | null;
}

/** The footage's own build first: its assemblies are the likeliest to be shown in it. */
export function buildFirst(assemblies: LinkAssembly[], buildId: string | undefined): LinkAssembly[] {
  return [...assemblies].sort((a, b) => Number(b.buildId === buildId) - Number(a.buildId === buildId));
}

/** "OM-G5-IN — pilot nose" for a part feature, "21-tooth coupler stack — pilot bearing on input shaft nose" for an interface. */
export function subjectName(
  subject: { featureId: string | null; interfaceId: string | null },
  sources: Pick<LinkSources, 'parts' | 'assemblies'>,
): string | null {
  if (subject.featureId) {
    for (const part of sources.parts ?? []) {
      const feature = part.features.find((candidate) => candidate.id === subject.featureId);
      if (feature) return `${part.partNumber} — ${feature.name}`;
    }
  }
  if (subject.interfaceId) {
    for (const assembly of sources.assemblies ?? []) {
      const found = assembly.interfaces.find((candidate) => candidate.id === subject.interfaceId);
      if (found) return `${assembly.name} — ${found.name}`;
    }
  }
  return null;
}

/** Subjects a new reading can have, grouped for a Select; values are "feature:<id>" or "interface:<id>". */
export function subjectChoices(parts: PartChoice[], assemblies: LinkAssembly[]) {
  return [
    {
      group: 'Part features',
      items: parts.flatMap((part) => part.features.map((feature) => ({ value: `feature:${feature.id}`, label: `${part.partNumber} — ${feature.name}` }))),
    },
    {
      group: 'Interfaces (across two parts)',
      items: assemblies.flatMap((assembly) =>
        assembly.interfaces.map((item) => ({ value: `interface:${item.id}`, label: `${assembly.name} — ${item.name}` })),
      ),
    },
  ].filter((group) => group.items.length > 0);
}

/** The workshop's fit checks grouped by assembly (the footage's build first), each with its state in words. */
export function fitCheckChoices(assemblies: LinkAssembly[], buildId: string | undefined) {
  return buildFirst(assemblies, buildId)
    .map((assembly) => ({
      group: assembly.buildId === buildId ? assembly.name : `${assembly.name} (${assembly.buildTitle})`,
      items: assembly.checks.map((check) => ({ value: check.id, label: `${check.title}${twinNote(check, assembly)} · ${CHECK_STATE_WORDS[check.state]}` })),
    }))
    .filter((group) => group.items.length > 0);
}

/**
 * What tells a check from another of the same title in its assembly: the interface it was derived from
 * (or "added by hand"), and, if that is shared too, its place among them in the order they were added.
 */
function twinNote(check: LinkAssembly['checks'][number], assembly: LinkAssembly): string {
  const sameTitle = assembly.checks.filter((other) => other.title.trim().toLowerCase() === check.title.trim().toLowerCase());
  if (sameTitle.length < 2) return '';
  const origin = (candidate: LinkAssembly['checks'][number]) =>
    candidate.interfaceId ? `at ${assembly.interfaces.find((item) => item.id === candidate.interfaceId)?.name ?? 'an interface'}` : 'added by hand';
  const sameOrigin = sameTitle.filter((other) => origin(other) === origin(check));
  const place = sameOrigin.length > 1 ? `, ${sameOrigin.indexOf(check) + 1} of ${sameOrigin.length}` : '';
  return ` (${origin(check)}${place})`;
}

/** Readings grouped: those linked to this footage first, each named with its subject. */
export function readingChoices(measurements: MeasurementChoice[], footageId: string, sources: Pick<LinkSources, 'parts' | 'assemblies'>) {
  const item = (reading: MeasurementChoice) => {
    const subject = subjectName(reading, sources);
    const at = reading.footageId === footageId && reading.footageTimeMs !== null ? ` at ${formatClock(reading.footageTimeMs, { tenths: true })}` : '';
    return { value: reading.id, label: `${reading.shown}${subject ? ` · ${subject}` : ''} (${reading.quantity})${at}` };
  };
  return [
    { group: 'Shown in this footage', items: measurements.filter((reading) => reading.footageId === footageId).map(item) },
    { group: 'Other readings', items: measurements.filter((reading) => reading.footageId !== footageId).map(item) },
  ].filter((group) => group.items.length > 0);
}

/** Guide steps, those anchored in this footage first (with their time). */
export function guideStepChoices(steps: { inFootage: GuideStepChoice[]; others: GuideStepChoice[] }) {
  const item = (step: GuideStepChoice, withTime: boolean) => ({
    value: step.id,
    label: `${step.guideTitle} · ${step.position}. ${step.title}${withTime && step.startMs !== null ? ` (${formatClock(step.startMs, { tenths: true })})` : ''}`,
  });
  return [
    { group: 'Anchored in this footage', items: steps.inFootage.map((step) => item(step, true)) },
    { group: 'Other steps', items: steps.others.map((step) => item(step, false)) },
  ].filter((group) => group.items.length > 0);
}

/**
 * The name of what a mark links to (part number, reading with its unit, fit check title, step title)
 * and where it lives. Undefined while the list it needs is loading; null when the mark links nothing.
 */
export function describeLink(mark: Mark, sources: LinkSources, workshopId: string): LinkDescription | null | undefined {
  const field = LINK_OF_KIND[mark.kind];
  const id = field ? mark[field] : null;
  if (!field || !id) return null;
  const missing = { name: 'not found', to: null };
  switch (field) {
    case 'partId': {
      if (!sources.parts) return undefined;
      const part = sources.parts.find((candidate) => candidate.id === id);
      return part ? { name: part.partNumber, to: paths.part.to(workshopId, part.id) } : missing;
    }
    case 'measurementId': {
      if (!sources.measurements || !sources.parts || !sources.assemblies) return undefined;
      const reading = sources.measurements.find((candidate) => candidate.id === id);
      if (!reading) return missing;
      const part = reading.featureId && sources.parts.find((candidate) => candidate.features.some((feature) => feature.id === reading.featureId));
      const assembly =
        reading.interfaceId && sources.assemblies.find((candidate) => candidate.interfaces.some((item) => item.id === reading.interfaceId));
      // An interface's readings are on its assembly's "Parts and interfaces" tab.
      const to = part ? paths.part.to(workshopId, part.id) : assembly ? `${paths.assembly.to(workshopId, assembly.id)}?tab=build` : null;
      return { name: reading.shown, to };
    }
    case 'fitCheckId': {
      if (!sources.assemblies) return undefined;
      for (const assembly of sources.assemblies) {
        const check = assembly.checks.find((candidate) => candidate.id === id);
        if (check) return { name: check.title, to: paths.assembly.to(workshopId, assembly.id) };
      }
      return missing;
    }
    case 'guideStepId': {
      if (!sources.guideSteps) return undefined;
      const step = [...sources.guideSteps.inFootage, ...sources.guideSteps.others].find((candidate) => candidate.id === id);
      return step ? { name: `${step.guideTitle} · ${step.position}. ${step.title}`, to: paths.guide.to(workshopId, step.guideId) } : missing;
    }
  }
}
