import fc from 'fast-check';
import { buildInventory } from '../../../planner/model/build-inventory';
import { countComponents, findBridges } from '../../../planner/impact/bridges';
import { scenarioWith } from '../fixtures/tiny-scenario';
import { randomNetwork } from '../fixtures/random-scenario';

describe('findBridges', () => {
  it('a span is a bridge exactly when removing it adds a component (brute force on random multigraphs)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1e6 }), fc.integer({ min: 2, max: 12 }), fc.integer({ min: 0, max: 16 }), (seed, n, m) => {
        const net = buildInventory(scenarioWith([], randomNetwork(seed, n, m))).network;
        const siteDown = new Uint8Array(n);
        siteDown[seed % n] = seed % 3 === 0 ? 1 : 0;
        const bridges = findBridges(net, { siteDown });
        const base = countComponents(net, { siteDown });
        net.spans.forEach((span) => {
          const spanDown = new Uint8Array(net.spans.length);
          spanDown[span.index] = 1;
          const touchesDown = siteDown[span.a] || siteDown[span.b];
          const expected = !touchesDown && span.a !== span.b && countComponents(net, { siteDown, spanDown }) > base;
          expect(bridges[span.index] === 1).toBe(expected);
        });
      }),
      { numRuns: 200 },
    );
  });
});
