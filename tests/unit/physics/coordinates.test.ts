// Coordinate conventions (shared/physics/coordinates.ts): ISO 80000-2 spherical angles; three.js y-up mapping.
import { describe, expect, it } from 'vitest';
import {
  cartesianToSpherical,
  gridIndex,
  physicsToThree,
  sphericalToCartesian,
  threeToPhysics,
} from '../../../shared/physics/coordinates';
import { expectClose } from './close-to';

describe('coordinates', () => {
  it('when +z, +x and +y are converted, then θ is measured from +z and φ from +x toward +y (REFERENCE.md §0)', () => {
    expect(cartesianToSpherical(0, 0, 2)).toEqual({ r: 2, theta: 0, phi: 0 });
    expect(cartesianToSpherical(1, 0, 0)).toEqual({ r: 1, theta: Math.PI / 2, phi: 0 });
    expect(cartesianToSpherical(0, 3, 0)).toEqual({ r: 3, theta: Math.PI / 2, phi: Math.PI / 2 });
    const back = sphericalToCartesian(
      ...(Object.values(cartesianToSpherical(1, 2, 3)) as [number, number, number]),
    );
    expectClose(back.x, 1, { rel: 1e-15 });
    expectClose(back.y, 2, { rel: 1e-15 });
    expectClose(back.z, 3, { rel: 1e-15 });
  });

  it('when mapped to three.js (y up), then physics z points up, handedness is kept and the map inverts', () => {
    expect(physicsToThree(0, 0, 1)).toEqual({ x: 0, y: 1, z: 0 });
    expect(physicsToThree(1, 2, 3)).toEqual({ x: 1, y: 3, z: -2 });
    expect(threeToPhysics(1, 3, -2)).toEqual({ x: 1, y: 2, z: 3 });
    // x̂ × ŷ = ẑ must survive the map.
    const X = physicsToThree(1, 0, 0);
    const Y = physicsToThree(0, 1, 0);
    const Z = physicsToThree(0, 0, 1);
    const cross = [X.y * Y.z - X.z * Y.y, X.z * Y.x - X.x * Y.z, X.x * Y.y - X.y * Y.x];
    expect(cross.map((v) => v + 0)).toEqual([Z.x, Z.y, Z.z]);
  });

  it('when indexing a grid, then x runs fastest', () => {
    expect(gridIndex(4, 1, 0, 0)).toBe(1);
    expect(gridIndex(4, 0, 1, 0)).toBe(4);
    expect(gridIndex(4, 0, 0, 1)).toBe(16);
  });
});
