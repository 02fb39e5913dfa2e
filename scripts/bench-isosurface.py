#!/usr/bin/python3
"""The isosurface job of scripts/bench-isosurface.ts in NumPy + scikit-image, for comparison.

Same states (4f_z3, 4f_xyz, Z = 1), grid (128^3 over the same half-width) and fraction
(0.9). Steps: evaluate psi with NumPy (closed forms below), find the level by a full sort and
cumulative sum (the usual NumPy way), mesh +sqrt(c) and -sqrt(c) with skimage.measure.marching_cubes
(Lewiner variant, with normals). Median of 5 runs after one warm-up; one thread requested through
the usual environment variables. Without scikit-image only the first two steps run.
Prints one JSON object.

R_43(r) = r^3 e^(-r/4) / (768 sqrt(35)) (Z = 1; Griffiths 2nd ed. Table 4.7, from memory; its
normalisation is checked below by quadrature). Real harmonics (common practice):
f_z3 = (1/4) sqrt(7/pi) (5z^3 - 3z r^2)/r^3, f_xyz = (1/2) sqrt(105/pi) xyz/r^3.
"""
import json
import os
import sys
import time

for var in ('OMP_NUM_THREADS', 'OPENBLAS_NUM_THREADS', 'MKL_NUM_THREADS'):
    os.environ.setdefault(var, '1')

import numpy as np
from scipy import integrate

try:
    from skimage import __version__ as skimage_version
    from skimage.measure import marching_cubes
except ImportError:
    marching_cubes = None
    skimage_version = None

GRID, ENCLOSED, RUNS = 128, 0.9, 5
# Half-width in bohr: scripts/bench passes the one Lobewright chose (suggestedExtent); 43 for 4f.
HALF = float(sys.argv[1]) if len(sys.argv) > 1 else 43.0


def radial_43(r):
    return r**3 * np.exp(-r / 4) / (768 * np.sqrt(35))


norm, _ = integrate.quad(lambda r: radial_43(r) ** 2 * r**2, 0, np.inf)
assert abs(norm - 1) < 1e-10, norm

ANGULAR = {
    '4f_z3': lambda x, y, z, r: 0.25 * np.sqrt(7 / np.pi) * (5 * z**3 - 3 * z * r**2) / r**3,
    '4f_xyz': lambda x, y, z, r: 0.5 * np.sqrt(105 / np.pi) * x * y * z / r**3,
}


def evaluate(label):
    axis = np.linspace(-HALF, HALF, GRID)
    z, y, x = np.meshgrid(axis, axis, axis, indexing='ij')  # x fastest in memory, as in Lobewright
    r = np.sqrt(x * x + y * y + z * z)
    return (radial_43(r) * ANGULAR[label](x, y, z, r)).astype(np.float32)


def level(psi, voxel):
    density = np.sort((psi.astype(np.float64) ** 2).ravel())[::-1]
    mass = np.cumsum(density) * voxel
    k = int(np.searchsorted(mass, ENCLOSED))
    return density[k], mass[k], mass[-1]


results = {}
h = 2 * HALF / (GRID - 1)
for label in ANGULAR:
    times = {'sample': [], 'level': [], 'mesh': [], 'total': []}
    for run in range(RUNS + 1):
        t0 = time.perf_counter()
        psi = evaluate(label)
        t1 = time.perf_counter()
        c, enclosed, total = level(psi, h**3)
        t2 = time.perf_counter()
        triangles = None
        if marching_cubes is not None:
            iso = float(np.sqrt(c))
            pos = marching_cubes(psi, iso, spacing=(h, h, h))
            neg = marching_cubes(-psi, iso, spacing=(h, h, h))
            triangles = {'positive': len(pos[1]), 'negative': len(neg[1])}
        t3 = time.perf_counter()
        if run == 0:
            continue
        for key, value in (('sample', t1 - t0), ('level', t2 - t1), ('mesh', t3 - t2), ('total', t3 - t0)):
            times[key].append(1000 * value)
    results[label] = {
        'densityLevel': float(c),
        'enclosed': float(enclosed),
        'gridTotal': float(total),
        'triangles': triangles,
        'extent': HALF,
        'ms': {k: (round(float(np.median(v)), 1) if marching_cubes is not None or k != 'mesh' else None) for k, v in times.items()},
    }

json.dump({
    'grid': GRID,
    'enclosed': ENCLOSED,
    'runs': RUNS,
    'statistic': 'median of 5 after one warm-up, milliseconds, one thread',
    'runtime': 'Python %s, NumPy %s, scikit-image %s' % (sys.version.split()[0], np.__version__, skimage_version),
    'states': results,
}, sys.stdout)
sys.stdout.write('\n')
