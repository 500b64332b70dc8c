import { Page } from '../../components/page';
import { useMe } from '../../features/auth/api/get-me';
import { FingerJointsCalculator } from '../../features/calculators/finger-joints/components/finger-joints-calculator';
import { SaveToPlan } from '../../features/calculators/finger-joints/components/save-to-plan';

export default function FingerJointsRoute() {
  const { data: member } = useMe();
  return (
    <Page
      title="Finger joints"
      lead="Lay out a box joint across two mating boards and get every pass of the cutter, with the step counts for a lead-screw indexing jig. Worked out in your browser as you type."
    >
      <FingerJointsCalculator saveSection={member ? (input) => <SaveToPlan input={input} /> : undefined} />
    </Page>
  );
}
