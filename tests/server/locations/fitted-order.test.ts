import { describe, expect, it } from 'vitest';
import { noStock, type PartStock } from '../../../server/repositories/stock.repository';
import { fittedOrder } from '../../../server/services/catalog/fitted-order';

const HERE = '00000000-0000-4000-8000-0000000000a1';
const at = (here: number, elsewhere = 0): PartStock => ({
  here: { locationId: HERE, onHand: here, bin: '' },
  elsewhere: elsewhere ? [{ locationId: '00000000-0000-4000-8000-0000000000b2', name: 'Other', onHand: elsewhere }] : [],
});
const fit = (id: string, position: string, stock: PartStock) => ({ id, position, stock });

describe('fitted parts order', () => {
  it('keeps positions in fitted order and puts a part on the shelf here above one that is not', () => {
    const ordered = fittedOrder([
      fit('coil-out-here', 'ignition coil', at(0, 3)),
      fit('coil-here', 'ignition coil', at(2)),
      fit('plug-none', 'spark plug', noStock(HERE)),
      fit('plug-here', 'spark plug', at(8)),
    ]);
    expect(ordered.map((f) => f.id)).toEqual(['coil-here', 'coil-out-here', 'plug-here', 'plug-none']);
  });

  it('leaves equals as they were (stable)', () => {
    const list = [fit('a', 'spark plug', at(1)), fit('b', 'spark plug', at(4)), fit('c', 'spark plug', at(0))];
    expect(fittedOrder(list).map((f) => f.id)).toEqual(['a', 'b', 'c']);
  });
});
