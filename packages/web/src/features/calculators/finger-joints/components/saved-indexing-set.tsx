import { Box, Heading, Link, Stack, Text } from '@chakra-ui/react';
import { planJoint, type JointInput } from '@jigwright/core';
import { useMemo, type ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';
import { paths } from '../../../../config/paths';
import { jointInputQuery } from '../joint-form';
import { CutTable } from './cut-table';
import { DriveFiguresList } from './drive-figures-list';
import { ExportButtons } from './export-buttons';
import { JointPicture } from './joint-picture';

function Part({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Stack gap="2">
      <Heading as="h3" size="md" color="walnut.700" fontWeight="600">
        {title}
      </Heading>
      {children}
    </Stack>
  );
}

/**
 * An indexing jig's saved set of calculator inputs on its plan page: the joint, the drive figures,
 * the files for the controller and the cut table, all worked out again from the inputs.
 */
export function SavedIndexingSet({ name, inputs }: { name: string; inputs: JointInput }) {
  const outcome = useMemo(() => planJoint(inputs), [inputs]);
  const calculatorHref = `${paths.fingerJoints.getHref()}?${jointInputQuery(inputs).toString()}`;
  return (
    <Stack as="section" aria-label="Cut sequence" gap="4">
      <Heading as="h2" size="lg" color="walnut.700" fontWeight="600">
        Cut sequence
      </Heading>
      <Text color="fg.muted">
        The designer’s indexing set: {name}.{' '}
        <Link asChild color="steel.700" textDecoration="underline">
          <RouterLink to={calculatorHref}>Open it in the finger-joint calculator</RouterLink>
        </Link>{' '}
        to change the board, the bit or the drive for your own jig.
      </Text>
      {outcome.ok ? (
        <Stack gap="6">
          <Box>
            <JointPicture plan={outcome.plan} />
          </Box>
          <Part title="Drive">
            <DriveFiguresList plan={outcome.plan} />
          </Part>
          <Part title="Files for the jig">
            <ExportButtons plan={outcome.plan} stale={false} shareHref={calculatorHref} />
          </Part>
          <Part title="Cut table">
            <CutTable plan={outcome.plan} />
          </Part>
        </Stack>
      ) : (
        <Text role="alert" color="brick.700">
          The saved set no longer makes a joint: {outcome.errors.map((error) => error.message).join(' ')}
        </Text>
      )}
    </Stack>
  );
}
