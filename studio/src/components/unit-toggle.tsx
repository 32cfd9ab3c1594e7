import { Group, SegmentedControl, Text } from '@mantine/core';

export interface UnitToggleProps<U extends string> {
  label: string;
  value: U;
  options: readonly { value: U; label: string }[];
  onChange: (unit: U) => void;
}

/** Which unit a table or a diagram shows its lengths in; the data itself never changes. */
export function UnitToggle<U extends string>({ label, value, options, onChange }: UnitToggleProps<U>) {
  return (
    <Group gap="xs" wrap="nowrap">
      <Text size="sm" id={`unit-toggle-${label}`}>
        {label}
      </Text>
      <SegmentedControl
        size="xs"
        aria-labelledby={`unit-toggle-${label}`}
        value={value}
        onChange={(next) => onChange(next as U)}
        data={options.map((option) => ({ value: option.value, label: option.label }))}
      />
    </Group>
  );
}
