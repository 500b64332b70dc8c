import { Page } from '../../components/page';
import { FingerJointsCalculator } from '../../features/calculators/finger-joints/components/finger-joints-calculator';

export default function FingerJointsRoute() {
  return (
    <Page
      title="Finger joints"
      lead="Lay out a box joint across two mating boards and get every pass of the cutter, with the step counts for a lead-screw indexing jig. Worked out in your browser as you type."
    >
      <FingerJointsCalculator />
    </Page>
  );
}
