import { Box, Button, Heading, Link, SimpleGrid, Spinner, Stack, Text } from '@chakra-ui/react';
import { buildCutList, DEFAULT_KERF, type CutListOptions } from '@jigwright/core';
import { lazy, Suspense, useMemo, useState, type ReactNode } from 'react';
import type { PlanDetail, RevisionDetail } from '../api/types';
import { usualCautions } from '../plan-cautions';
import { revisionCutListParts, revisionDrawings } from '../revision-parts';
import { formatLength, type Units } from '../units';
import { CATEGORY_NAMES, LICENCES, TOOLS } from '../vocabulary';
import { buildCountText, ratingText } from './plan-card';
import { AttachmentsList } from './attachments-list';
import { CutListView } from './cut-list-view';
import { DrawingView } from './drawing-view';
import { HardwareTable } from './hardware-table';
import { NotesMarkdown } from './notes-markdown';
import { RevisionCompare } from './revision-compare';
import { formatDate, RevisionHistory } from './revision-history';
import { SafetyPanel } from './safety-panel';
import { UnitsToggle } from './units-toggle';

// three.js comes only with this chunk, when a visitor asks for the 3D preview.
const PartPreview3d = lazy(() => import('./preview-3d/part-preview-3d'));

/**
 * The printed shop sheet is the cut list alone: everything else is taken out of the flow so that
 * it leaves no blank pages, and the pictures are kept small enough for one page where they fit.
 */
const PRINT_STYLES = `@media print {
  html, body { background: white !important; }
  header, footer, [data-plan-sections] > :not([data-shop-sheet]), [data-print-hide] { display: none !important; }
  body * { visibility: hidden; }
  [data-shop-sheet], [data-shop-sheet] * { visibility: visible; }
  [data-shop-sheet] { position: absolute; left: 0; top: 0; width: 100%; }
  [data-shop-sheet] svg { max-height: 5cm; width: auto !important; }
  .cut-list-group { break-inside: avoid; }
}`;

function Section({ title, children, ...rest }: { title: string; children: ReactNode; 'data-shop-sheet'?: string }) {
  return (
    <Stack as="section" gap="3" aria-label={title} {...rest}>
      <Heading as="h2" size="lg" color="walnut.700" fontWeight="600">
        {title}
      </Heading>
      {children}
    </Stack>
  );
}

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <Box>
      <Text as="dt" fontSize="xs" textTransform="uppercase" letterSpacing="wide" color="fg.muted">
        {term}
      </Text>
      <Text as="dd">{children}</Text>
    </Box>
  );
}

export interface PlanPageProps {
  plan: PlanDetail;
  revision: RevisionDetail;
  units: Units;
  onUnitsChange: (units: Units) => void;
  onShowRevision: (number: number) => void;
  /** What the viewer may do with the plan (the owner's editing, a moderator's decisions), from the route. */
  actions?: ReactNode;
  /** Kerf, sheets, bars, allowances and prices for the cut list, e.g. from the viewer's shop profile. */
  cutListOptions?: CutListOptions;
  /** A line under the cut list's heading saying whose settings it uses. */
  cutListNote?: ReactNode;
  /** ISO 4217 code of the prices in `cutListOptions`. */
  currency?: string;
  /** Sections other features add after the cut list (an indexing jig's cut sequence). */
  afterCutList?: ReactNode;
}

/** Everything a builder reads on a plan's page, for one of its revisions. */
export function PlanPage({
  plan,
  revision,
  units,
  onUnitsChange,
  onShowRevision,
  actions,
  cutListOptions,
  cutListNote,
  currency,
  afterCutList,
}: PlanPageProps) {
  const kerf = cutListOptions?.kerf ?? DEFAULT_KERF;
  const [selectedPart, setSelectedPart] = useState<string | null>(null);
  const [show3d, setShow3d] = useState(false);
  const drawings = useMemo(() => revisionDrawings(revision), [revision]);
  const cutList = useMemo(
    () => buildCutList(revisionCutListParts(revision), { ...cutListOptions, kerf }),
    [revision, cutListOptions, kerf],
  );
  const benchParts = useMemo(() => drawings.flatMap((drawing) => drawing.analysis.parts), [drawings]);
  const thicknessOf = useMemo(() => {
    const byName = new Map(revision.parts.map((part) => [part.name, part.thickness]));
    return (name: string) => byName.get(name) ?? 18;
  }, [revision]);
  const select = (name: string) => setSelectedPart((current) => (current === name ? null : name));
  const latest = plan.latestRevision;
  const licence = LICENCES[plan.licence];

  return (
    <Stack gap="8" data-plan-sections="">
      <style>{PRINT_STYLES}</style>
      {actions && <Box data-print-hide="">{actions}</Box>}
      <Stack as="section" aria-label="Overview" gap="4">
        <SimpleGrid as="dl" columns={{ base: 2, md: 4 }} gap="4">
          <Fact term="Designer">{plan.designer.displayName}</Fact>
          <Fact term="Category">
            {CATEGORY_NAMES[plan.category]}
            {plan.motorised ? ', motorised' : ''}
          </Fact>
          <Fact term="Licence">
            <Link href={licence.url} color="steel.700" target="_blank" rel="noreferrer">
              {licence.name}
            </Link>
          </Fact>
          <Fact term="Tools needed">{plan.tools.map((tool) => TOOLS[tool].name).join(', ') || 'hand tools'}</Fact>
          <Fact term="Latest revision">
            {latest ? `r${latest.number}, ${formatDate(latest.publishedAt)}` : 'not published yet'}
          </Fact>
          <Fact term="Showing">
            r{revision.number}, {formatDate(revision.publishedAt)}
          </Fact>
          <Fact term="Rating">{ratingText(plan.rating)}</Fact>
          <Fact term="Build reports">{buildCountText(plan.buildCount)}</Fact>
        </SimpleGrid>
        <Box data-print-hide="">
          <UnitsToggle units={units} onChange={onUnitsChange} />
        </Box>
      </Stack>

      <SafetyPanel notes={revision.safetyNotes} cautions={usualCautions(plan)} />

      <Section title="Drawing">
        {drawings.length === 0 && <Text color="fg.muted">This revision has no analysed drawing yet.</Text>}
        {drawings.map((drawing) => (
          <Stack key={drawing.id} gap="1">
            <Text fontSize="sm" color="fg.muted">
              {drawing.fileName}
            </Text>
            <DrawingView
              analysis={drawing.analysis}
              units={units}
              label={`Drawing ${drawing.fileName}, r${revision.number}`}
              selectedPart={selectedPart}
              onSelectPart={select}
            />
          </Stack>
        ))}
        {benchParts.length > 0 &&
          (show3d ? (
            <Suspense
              fallback={
                <Text color="fg.muted">
                  <Spinner size="sm" me="2" />
                  Loading the 3D preview…
                </Text>
              }
            >
              <PartPreview3d
                parts={benchParts}
                thicknessOf={thicknessOf}
                selectedPart={selectedPart}
                onSelectPart={select}
              />
            </Suspense>
          ) : (
            <Box>
              <Button variant="outline" colorPalette="steel" onClick={() => setShow3d(true)}>
                Show in 3D
              </Button>
            </Box>
          ))}
      </Section>

      <Section title="Cut list" data-shop-sheet="">
        <Text color="fg.muted" fontSize="sm">
          {plan.title}, r{revision.number}. Rough sizes add the usual milling allowance for solid stock; sheet layouts
          allow a {formatLength(kerf, units)} kerf.
        </Text>
        {cutListNote && <Box data-print-hide="">{cutListNote}</Box>}
        <CutListView
          cutList={cutList}
          units={units}
          kerf={kerf}
          currency={currency}
          fileName={`${plan.slug}-r${revision.number}-cut-list.csv`}
          selectedPart={selectedPart}
          onSelectPart={select}
        />
      </Section>

      {afterCutList}

      <Section title="Hardware list">
        <HardwareTable rows={revision.hardware} />
      </Section>

      <Section title="Build notes">
        {revision.notes.trim() ? (
          <NotesMarkdown text={revision.notes} />
        ) : (
          <Text color="fg.muted">No build notes yet.</Text>
        )}
      </Section>

      <Section title="Attachments">
        <AttachmentsList attachments={revision.attachments} />
      </Section>

      <Section title="Revision history">
        <RevisionHistory revisions={plan.revisions} shown={revision.number} onShow={onShowRevision} />
      </Section>

      {plan.revisions.length > 1 && (
        <Section title="Compare revisions">
          <RevisionCompare slug={plan.slug} revisions={plan.revisions} units={units} />
        </Section>
      )}
    </Stack>
  );
}
