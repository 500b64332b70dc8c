import { Box, Button, Checkbox, Field, Fieldset, Flex, Input, NativeSelect, SimpleGrid, Stack } from '@chakra-ui/react';
import { useState, type FormEvent, type ReactNode } from 'react';
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
  return (
    <Field.Root>
      <Field.Label fontSize="sm">{label}</Field.Label>
      <NativeSelect.Root size="sm" bg="bg.panel">
        <NativeSelect.Field value={value} onChange={(event) => onChange(event.target.value)}>
          {children}
        </NativeSelect.Field>
        <NativeSelect.Indicator />
      </NativeSelect.Root>
    </Field.Root>
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
          <Field.Root flex="1">
            <Field.Label>Search plans</Field.Label>
            <Input
              type="search"
              bg="bg.panel"
              value={q}
              placeholder="Title, summary, tags or build notes"
              onChange={(event) => setQ(event.target.value)}
            />
          </Field.Root>
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
          <Checkbox.Root
            size="sm"
            checked={filter.hasBuilds}
            onCheckedChange={(details) => change({ hasBuilds: details.checked === true })}
          >
            <Checkbox.HiddenInput />
            <Checkbox.Control />
            <Checkbox.Label>Has build reports</Checkbox.Label>
          </Checkbox.Root>
        </Box>
      </SimpleGrid>
      <Fieldset.Root>
        <Fieldset.Legend fontSize="sm">Tools needed (any of)</Fieldset.Legend>
        <Flex gap="4" flexWrap="wrap" mt="1">
          {(Object.keys(TOOLS) as Tool[]).map((tool) => (
            <Checkbox.Root
              key={tool}
              size="sm"
              checked={filter.tools.includes(tool)}
              onCheckedChange={(details) => toggleTool(tool, details.checked === true)}
            >
              <Checkbox.HiddenInput />
              <Checkbox.Control />
              <Checkbox.Label>{TOOLS[tool].name}</Checkbox.Label>
            </Checkbox.Root>
          ))}
        </Flex>
      </Fieldset.Root>
    </Stack>
  );
}
