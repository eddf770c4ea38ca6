// Migrations in the order they apply.
import { InitialSchema1796189683213 } from './1796189683213-InitialSchema';
import { RevisionImmutability1796189683214 } from './1796189683214-RevisionImmutability';
import { TeamAndSharing1796216390870 } from './1796216390870-TeamAndSharing';
import { TimeStudies1796193256066 } from './1796193256066-TimeStudies';
import { PriceLists1796205600000 } from './1796205600000-PriceLists';

export const migrations = [
  InitialSchema1796189683213,
  RevisionImmutability1796189683214,
  TimeStudies1796193256066,
  PriceLists1796205600000,
  TeamAndSharing1796216390870,
];
