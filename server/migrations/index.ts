import { Foundation1764600000000 } from './1764600000000-Foundation';
import { Catalog1764600100000 } from './1764600100000-Catalog';
import { PriceLists1764600200000 } from './1764600200000-PriceLists';
import { FitReports1764600300000 } from './1764600300000-FitReports';
import { RateLimits1764600500000 } from './1764600500000-RateLimits';
import { ApiKeys1764600510000 } from './1764600510000-ApiKeys';
import { SellPriceRule1764600600000 } from './1764600600000-SellPriceRule';
import { Locations1764600700000 } from './1764600700000-Locations';

// Listed explicitly: globs find nothing under tsx and vitest.
export const MIGRATIONS = [
  Foundation1764600000000,
  Catalog1764600100000,
  PriceLists1764600200000,
  FitReports1764600300000,
  RateLimits1764600500000,
  ApiKeys1764600510000,
  SellPriceRule1764600600000,
  Locations1764600700000,
];
