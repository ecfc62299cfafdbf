import type { VehicleSeed } from './types';

export const MAKES = ['Varrick', 'Solenne', 'Odrin', 'Kaymor', 'Talvena'] as const;

/** A model generation: every year in the range comes with each trim and its engine. */
interface Generation {
  make: (typeof MAKES)[number];
  model: string;
  from: number;
  to: number;
  trims: Record<string, string>;
}

const generations: Generation[] = [
  { make: 'Varrick', model: 'Halvard', from: 2008, to: 2015, trims: { Core: 'VK16', Plus: 'VK18', Sport: 'VK20T' } },
  { make: 'Varrick', model: 'Halvard', from: 2016, to: 2024, trims: { Core: 'VK14T', Plus: 'VK18', Sport: 'VK20T' } },
  { make: 'Varrick', model: 'Pennon', from: 2006, to: 2013, trims: { Core: 'VK25', Touring: 'VK30' } },
  { make: 'Varrick', model: 'Pennon', from: 2014, to: 2024, trims: { Core: 'VK25', Touring: 'VK35T' } },
  { make: 'Varrick', model: 'Quillet', from: 2012, to: 2020, trims: { Core: 'VK18', Trail: 'VK20T' } },
  { make: 'Solenne', model: 'Marivo', from: 2010, to: 2024, trims: { Core: 'SN12' } },
  { make: 'Solenne', model: 'Marivo', from: 2014, to: 2024, trims: { Eco: 'SN15' } },
  { make: 'Solenne', model: 'Orlesse', from: 2005, to: 2012, trims: { Core: 'SN18', Touring: 'SN25' } },
  { make: 'Solenne', model: 'Orlesse', from: 2013, to: 2024, trims: { Core: 'SN20', Sport: 'SN20T' } },
  { make: 'Solenne', model: 'Tamsin', from: 2015, to: 2024, trims: { Plus: 'SN20', Grand: 'SN30T' } },
  { make: 'Odrin', model: 'Brakker', from: 2004, to: 2008, trims: { Work: 'OD40', Crew: 'OD57' } },
  { make: 'Odrin', model: 'Brakker', from: 2009, to: 2016, trims: { Work: 'OD33', Crew: 'OD57' } },
  { make: 'Odrin', model: 'Brakker', from: 2017, to: 2024, trims: { Work: 'OD27T', Crew: 'OD50' } },
  { make: 'Odrin', model: 'Fennet', from: 2006, to: 2014, trims: { Cargo: 'OD24' } },
  { make: 'Odrin', model: 'Fennet', from: 2015, to: 2024, trims: { Cargo: 'OD20' } },
  { make: 'Odrin', model: 'Tollard', from: 2004, to: 2007, trims: { Core: 'OD40' } },
  { make: 'Kaymor', model: 'Nimbo', from: 2004, to: 2011, trims: { Core: 'KM13' } },
  { make: 'Kaymor', model: 'Nimbo', from: 2012, to: 2024, trims: { Core: 'KM10' } },
  { make: 'Kaymor', model: 'Nimbo', from: 2016, to: 2024, trims: { Turbo: 'KM10T' } },
  { make: 'Kaymor', model: 'Pello', from: 2009, to: 2024, trims: { Core: 'KM16' } },
  { make: 'Kaymor', model: 'Pello', from: 2014, to: 2024, trims: { Sport: 'KM16T' } },
  { make: 'Talvena', model: 'Esker', from: 2007, to: 2015, trims: { Core: 'TV16' } },
  { make: 'Talvena', model: 'Esker', from: 2010, to: 2015, trims: { Sport: 'TV18S' } },
  { make: 'Talvena', model: 'Esker', from: 2016, to: 2024, trims: { Core: 'TV20', Sport: 'TV23T' } },
  { make: 'Talvena', model: 'Merel', from: 2004, to: 2012, trims: { Core: 'TV22' } },
  { make: 'Talvena', model: 'Merel', from: 2013, to: 2024, trims: { Core: 'TV20', Touring: 'TV36' } },
  { make: 'Talvena', model: 'Caddow', from: 2011, to: 2024, trims: { Core: 'TV36' } },
];

export const vehicles: VehicleSeed[] = generations.flatMap(({ make, model, from, to, trims }) =>
  Array.from({ length: to - from + 1 }, (_, i) => from + i).flatMap((year) =>
    Object.entries(trims).map(([trim, engineCode]) => ({ year, make, model, trim, engineCode })),
  ),
);
