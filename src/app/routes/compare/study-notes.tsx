// The closing part of a comparison of studies: what it assumes and the safety caution every report carries.
import { Card, CardTitle } from '../../../components/ui/card';
import { ReportSafetyCaution } from '../../../features/compare/components/model-notes';
import { StudyAssumptions } from '../../../features/study-compare/components/study-assumptions';

export function StudyNotes() {
  return (
    <>
      <Card aria-labelledby="study-assumptions-title" className="flex flex-col gap-3 print-section">
        <CardTitle id="study-assumptions-title">Model assumptions</CardTitle>
        <StudyAssumptions />
      </Card>
      <ReportSafetyCaution />
    </>
  );
}
