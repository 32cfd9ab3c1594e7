import { Alert, Button, Checkbox, Group, NativeSelect, Stack, Table, Text, Title } from '@mantine/core';
import { memo, useCallback, useMemo, useState } from 'react';
import type { FollowDelivery, MailPreferences, MailPreferencesChange } from '../api/queries';
import { KIND_IN_WORDS } from './follow-words';

export const DELIVERY_WORDS: Record<FollowDelivery, string> = {
  at_once: 'Every change at once',
  daily: 'Daily digest',
  weekly: 'Weekly digest',
  paused: 'Paused',
};

const WEEKDAYS = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];

/** Every IANA zone this browser knows, with the saved one and UTC always among them (older engines list neither). */
function timeZoneChoices(saved: string): string[] {
  const known = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return [...new Set(['UTC', saved, ...known])].sort((a, b) => (a === 'UTC' ? -1 : b === 'UTC' ? 1 : a.localeCompare(b)));
}

function browserTimeZone(): string | null {
  try {
    return Intl.DateTimeFormat().resolvedOptions().timeZone ?? null;
  } catch {
    return null;
  }
}

/** Some 400 zones: drawn again only when the zone changes, not on every other choice in the form. */
const TimeZoneSelect = memo(function TimeZoneSelect({ value, zones, onChange }: { value: string; zones: string[]; onChange: (zone: string) => void }) {
  return <NativeSelect label="Time zone" value={value} data={zones} onChange={(event) => onChange(event.currentTarget.value)} />;
});

/** Only what the person changed, so a save never overwrites a setting changed elsewhere meanwhile. */
export function changesBetween(saved: MailPreferences, draft: MailPreferences): MailPreferencesChange {
  const change: MailPreferencesChange = {};
  if (draft.timeZone !== saved.timeZone) change.timeZone = draft.timeZone;
  if (draft.digestHour !== saved.digestHour) change.digestHour = draft.digestHour;
  if (draft.digestWeekday !== saved.digestWeekday) change.digestWeekday = draft.digestWeekday;
  if (draft.fitReportMail !== saved.fitReportMail) change.fitReportMail = draft.fitReportMail;
  const follows = draft.follows
    .filter((follow) => saved.follows.find((before) => before.id === follow.id)?.delivery !== follow.delivery)
    .map((follow) => ({ followId: follow.id, delivery: follow.delivery }));
  if (follows.length) change.follows = follows;
  return change;
}

/**
 * One person's mail settings: how each follow's news comes (every change at once, a daily or weekly
 * digest at a local hour, or paused), whether new fit reports of their workshops reach them, and, when
 * their address refused our mail again and again, the note saying so with a way to resume. Used signed
 * in (account page) and signed out (a mail's preferences link); the caller does the saving.
 */
export function MailPreferencesForm({
  preferences,
  onSave,
  saving,
}: {
  preferences: MailPreferences;
  onSave: (change: MailPreferencesChange) => void;
  saving: boolean;
}) {
  const [draft, setDraft] = useState(preferences);
  const zones = useMemo(() => timeZoneChoices(preferences.timeZone), [preferences.timeZone]);
  const here = browserTimeZone();
  const change = changesBetween(preferences, draft);
  const changed = Object.keys(change).length > 0;
  const setTimeZone = useCallback((timeZone: string) => setDraft((current) => ({ ...current, timeZone })), []);
  const usesDigests = draft.follows.some((follow) => follow.delivery === 'daily' || follow.delivery === 'weekly');

  return (
    <Stack gap="md">
      {preferences.pausedAt && (
        <Alert color="yellow" role="alert" title={`Mail to ${preferences.email} is paused`} data-testid="mail-paused">
          <Stack gap="xs" align="flex-start">
            <Text size="sm">{preferences.pausedNote ?? 'Your mail server refused our mail several times, so we stopped sending.'}</Text>
            <Button size="xs" loading={saving} onClick={() => onSave({ resume: true })}>
              Resume mail
            </Button>
          </Stack>
        </Alert>
      )}

      <Stack gap="xs">
        <Title order={4} size="h5">
          Fit news for what you follow
        </Title>
        {draft.follows.length === 0 ? (
          <Text size="sm" c="dimmed" data-testid="preferences-no-follows">
            You follow nothing at the moment, so no fit news comes to {preferences.email}.
          </Text>
        ) : (
          <Table.ScrollContainer minWidth={420}>
            <Table verticalSpacing="xs" aria-label="Delivery of each follow">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Following</Table.Th>
                  <Table.Th>Workshop</Table.Th>
                  <Table.Th>Delivery</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {draft.follows.map((follow) => (
                  <Table.Tr key={follow.id} data-testid="preference-row">
                    <Table.Td>
                      {follow.label}{' '}
                      <Text span size="xs" c="dimmed">
                        ({KIND_IN_WORDS[follow.targetKind].toLowerCase()})
                      </Text>
                    </Table.Td>
                    <Table.Td>{follow.workshopName}</Table.Td>
                    <Table.Td>
                      <NativeSelect
                        size="xs"
                        miw="13rem"
                        aria-label={`Delivery for ${follow.label}`}
                        value={follow.delivery}
                        data={Object.entries(DELIVERY_WORDS).map(([value, label]) => ({ value, label }))}
                        onChange={(event) => {
                          const delivery = event.currentTarget.value as FollowDelivery;
                          setDraft((current) => ({
                            ...current,
                            follows: current.follows.map((candidate) => (candidate.id === follow.id ? { ...candidate, delivery } : candidate)),
                          }));
                        }}
                      />
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
        )}
      </Stack>

      <Stack gap="xs">
        <Title order={4} size="h5">
          When digests go out
        </Title>
        <Text size="sm" c="dimmed">
          {usesDigests
            ? 'A digest gathers the changes since the last one, per guide, with each check’s state before and after.'
            : 'Used by follows you set to a daily or weekly digest.'}
        </Text>
        <Group align="flex-end" gap="sm" wrap="wrap">
          <NativeSelect
            label="Hour"
            value={String(draft.digestHour)}
            data={Array.from({ length: 24 }, (_, hour) => ({ value: String(hour), label: `${String(hour).padStart(2, '0')}:00` }))}
            onChange={(event) => {
              const digestHour = Number(event.currentTarget.value);
              setDraft((current) => ({ ...current, digestHour }));
            }}
          />
          <NativeSelect
            label="Weekly digest on"
            value={String(draft.digestWeekday)}
            data={WEEKDAYS.map((day, index) => ({ value: String(index), label: day }))}
            onChange={(event) => {
              const digestWeekday = Number(event.currentTarget.value);
              setDraft((current) => ({ ...current, digestWeekday }));
            }}
          />
          <TimeZoneSelect value={draft.timeZone} zones={zones} onChange={setTimeZone} />
          {here && here !== draft.timeZone && zones.includes(here) && (
            <Button size="xs" variant="subtle" onClick={() => setDraft((current) => ({ ...current, timeZone: here }))}>
              Use {here}
            </Button>
          )}
        </Group>
      </Stack>

      <Checkbox
        label="Mail me when a reader sends a fit report to a workshop I own or edit"
        checked={draft.fitReportMail === 'at_once'}
        onChange={(event) => {
          const on = event.currentTarget.checked;
          setDraft((current) => ({ ...current, fitReportMail: on ? 'at_once' : 'off' }));
        }}
      />

      <Group gap="sm">
        <Button onClick={() => onSave(change)} disabled={!changed} loading={saving}>
          Save mail preferences
        </Button>
        {changed && (
          <Button variant="default" onClick={() => setDraft(preferences)} disabled={saving}>
            Undo changes
          </Button>
        )}
      </Group>
    </Stack>
  );
}
