// A comparison of studies as the page and the report both show it: the question, the comparison, and
// the closing assumptions with the safety caution every report carries.
import type { Scenario } from '../../../../shared/scenario/scenario';
import { Card, CardTitle } from '../../../components/ui/card';
import { ReportSafetyCaution } from '../../../features/compare/components/model-notes';
import { StudyAssumptions } from '../../../features/study-compare/components/study-assumptions';
import { StudyCompareView } from '../../../features/study-compare/components/study-compare-view';
import type { ComparedStudy } from '../../../features/study-compare/utils/study-comparison';
import { STUDY_COMPARE_QUESTION } from './question';

interface ComparedStudiesProps {
  compared: readonly ComparedStudy[];
  scenarios: readonly (Scenario | null)[];
  details: readonly string[];
}

export function ComparedStudies({ compared, scenarios, details }: ComparedStudiesProps) {
  return (
    <StudyCompareView
      studies={compared}
      scenarios={scenarios}
      details={details}
      question={STUDY_COMPARE_QUESTION}
      notes={
        <>
          <Card aria-labelledby="study-assumptions-title" className="flex flex-col gap-3 print-section">
            <CardTitle id="study-assumptions-title">Model assumptions</CardTitle>
            <StudyAssumptions />
          </Card>
          <ReportSafetyCaution />
        </>
      }
    />
  );
}
