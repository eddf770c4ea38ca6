// Migrations in the order they apply.
import { InitialSchema1796189683213 } from './1796189683213-InitialSchema';
import { RevisionImmutability1796189683214 } from './1796189683214-RevisionImmutability';
import { TeamAndSharing1796216390870 } from './1796216390870-TeamAndSharing';
import { TimeStudies1796193256066 } from './1796193256066-TimeStudies';
import { Studies1796216413737 } from './1796216413737-Studies';
import { StudyQueue1796227373997 } from './1796227373997-StudyQueue';
import { PriceLists1796205600000 } from './1796205600000-PriceLists';
import { SignInAttempts1796210000000 } from './1796210000000-SignInAttempts';
import { StoredChecks1796210000001 } from './1796210000001-StoredChecks';
import { ShareStudies1796220000000 } from './1796220000000-ShareStudies';
import { ConveyorMode1796230000000 } from './1796230000000-ConveyorMode';
import { ShareComparisons1796231000000 } from './1796231000000-ShareComparisons';
import { StudyJobSeries1796232000000 } from './1796232000000-StudyJobSeries';

export const migrations = [
  InitialSchema1796189683213,
  RevisionImmutability1796189683214,
  TimeStudies1796193256066,
  PriceLists1796205600000,
  SignInAttempts1796210000000,
  StoredChecks1796210000001,
  TeamAndSharing1796216390870,
  Studies1796216413737,
  ShareStudies1796220000000,
  StudyQueue1796227373997,
  ConveyorMode1796230000000,
  ShareComparisons1796231000000,
  StudyJobSeries1796232000000,
];
