import { Box, Button, chakra, Flex, Input, NativeSelect, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import { useId, useState, type FormEvent, type ReactNode } from 'react';
import type { Licence, LibrarySort, PlanCategory, Tool } from '../api/types';
import { LIBRARY_SORT_NAMES, type LibraryFilter } from '../library-filter';
import { CATEGORY_NAMES, LICENCES, TOOLS } from '../vocabulary';

function Choice({
  label,
  value,
  onChange,
  children,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  children: ReactNode;
}) {
  const id = useId();
  return (
    <Box>
      <chakra.label htmlFor={id} display="block" fontSize="sm" fontWeight="500" mb="1.5">
        {label}
      </chakra.label>
      <NativeSelect.Root size="sm" bg="bg.panel">
        <NativeSelect.Field id={id} value={value} onChange={(event) => onChange(event.target.value)}>
          {children}
        </NativeSelect.Field>
        <NativeSelect.Indicator />
      </NativeSelect.Root>
    </Box>
  );
}

/** A plain checkbox: the library page stays light without a checkbox state machine. */
function Tick({ label, checked, onChange }: { label: string; checked: boolean; onChange: (checked: boolean) => void }) {
  return (
    <chakra.label display="inline-flex" alignItems="center" gap="2" fontSize="sm" cursor="pointer">
      <chakra.input
        type="checkbox"
        checked={checked}
        onChange={(event) => onChange(event.target.checked)}
        width="4"
        height="4"
        accentColor="steel.600"
      />
      {label}
    </chakra.label>
  );
}

/**
 * The library's search box, filters and sort. Each change is a new entry in the history (the back
 * button undoes it) and goes back to the first page.
 */
export function LibraryFilters({
  filter,
  onChange,
}: {
  filter: LibraryFilter;
  onChange: (next: LibraryFilter) => void;
}) {
  const searchId = useId();
  const [q, setQ] = useState(filter.q);
  const [shownQ, setShownQ] = useState(filter.q);
  if (shownQ !== filter.q) {
    setShownQ(filter.q);
    setQ(filter.q);
  }
  const change = (patch: Partial<LibraryFilter>) => onChange({ ...filter, ...patch, page: 1 });
  const submit = (event: FormEvent) => {
    event.preventDefault();
    change({ q: q.trim() });
  };
  const toggleTool = (tool: Tool, on: boolean) =>
    change({ tools: on ? [...filter.tools, tool] : filter.tools.filter((t) => t !== tool) });

  return (
    <Stack gap="4" as="section" aria-label="Search and filters">
      <form role="search" onSubmit={submit}>
        <Flex gap="2" align="flex-end">
          <Box flex="1">
            <chakra.label htmlFor={searchId} display="block" fontSize="sm" fontWeight="500" mb="1.5">
              Search plans
            </chakra.label>
            <Input
              id={searchId}
              type="search"
              bg="bg.panel"
              value={q}
              placeholder="Title, summary, tags or build notes"
              onChange={(event) => setQ(event.target.value)}
            />
          </Box>
          <Button type="submit" colorPalette="steel">
            Search
          </Button>
        </Flex>
      </form>
      <SimpleGrid columns={{ base: 2, md: 3, lg: 6 }} gap="3">
        <Choice
          label="Category"
          value={filter.category ?? ''}
          onChange={(value) => change({ category: (value || null) as PlanCategory | null })}
        >
          <option value="">Any category</option>
          {Object.entries(CATEGORY_NAMES).map(([id, name]) => (
            <option key={id} value={id}>
              {name}
            </option>
          ))}
        </Choice>
        <Choice
          label="Motorised"
          value={filter.motorised === null ? '' : filter.motorised ? 'yes' : 'no'}
          onChange={(value) => change({ motorised: value === '' ? null : value === 'yes' })}
        >
          <option value="">Either</option>
          <option value="yes">Motorised</option>
          <option value="no">Not motorised</option>
        </Choice>
        <Choice
          label="Licence"
          value={filter.licence ?? ''}
          onChange={(value) => change({ licence: (value || null) as Licence | null })}
        >
          <option value="">Any licence</option>
          {Object.entries(LICENCES).map(([id, { name }]) => (
            <option key={id} value={id}>
              {name}
            </option>
          ))}
        </Choice>
        <Choice
          label="Minimum rating"
          value={filter.minRating === null ? '' : String(filter.minRating)}
          onChange={(value) => change({ minRating: value ? Number(value) : null })}
        >
          <option value="">Any rating</option>
          {[4, 3, 2, 1].map((stars) => (
            <option key={stars} value={stars}>
              {stars} or more
            </option>
          ))}
        </Choice>
        <Choice label="Sort by" value={filter.sort} onChange={(value) => change({ sort: value as LibrarySort })}>
          {Object.entries(LIBRARY_SORT_NAMES).map(([id, name]) => (
            <option key={id} value={id}>
              {name}
            </option>
          ))}
        </Choice>
        <Box alignSelf="flex-end" pb="1.5">
          <Tick label="Has build reports" checked={filter.hasBuilds} onChange={(hasBuilds) => change({ hasBuilds })} />
        </Box>
      </SimpleGrid>
      <chakra.fieldset border="0" p="0" m="0">
        <Text as="legend" fontSize="sm" fontWeight="500">
          Tools needed (any of)
        </Text>
        <Flex gap="4" flexWrap="wrap" mt="1">
          {(Object.keys(TOOLS) as Tool[]).map((tool) => (
            <Tick
              key={tool}
              label={TOOLS[tool].name}
              checked={filter.tools.includes(tool)}
              onChange={(on) => toggleTool(tool, on)}
            />
          ))}
        </Flex>
      </chakra.fieldset>
    </Stack>
  );
}
