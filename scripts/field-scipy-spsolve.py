"""Times scipy's sparse direct solver (SuperLU via scipy.sparse.linalg.spsolve / splu) on the
matrices written by scripts/field-matrix-market.ts, one thread, best of 5 CPU time, and reports
its residual and the relative difference from fluxwright's solution. Not run in CI.

    python3 scripts/field-scipy-spsolve.py <folder written by field-matrix-market.ts>
"""
import os
import sys
import time

os.environ.setdefault("OMP_NUM_THREADS", "1")
os.environ.setdefault("OPENBLAS_NUM_THREADS", "1")

import numpy as np  # noqa: E402
import scipy  # noqa: E402
import scipy.io  # noqa: E402
import scipy.sparse.linalg as sla  # noqa: E402

folder = sys.argv[1]
print(f"scipy {scipy.__version__}")
for name in ("solenoid-bar", "coil-over-plate"):
    A = scipy.io.mmread(os.path.join(folder, f"{name}.mtx")).tocsc()
    b = scipy.io.mmread(os.path.join(folder, f"{name}-rhs.mtx")).ravel()
    best_spsolve = best_splu = float("inf")
    for _ in range(5):
        t0 = time.process_time()
        x = sla.spsolve(A, b)
        best_spsolve = min(best_spsolve, time.process_time() - t0)
        t0 = time.process_time()
        lu = sla.splu(A)
        y = lu.solve(b)
        best_splu = min(best_splu, time.process_time() - t0)
    res = np.linalg.norm(A @ x - b) / np.linalg.norm(b)
    ours = scipy.io.mmread(os.path.join(folder, f"{name}-x.mtx")).ravel()
    diff = np.linalg.norm(ours - x) / np.linalg.norm(x)
    print(f"{name}: n = {A.shape[0]}, spsolve {best_spsolve * 1e3:.1f} ms, splu+solve {best_splu * 1e3:.1f} ms, "
          f"nnz(L+U) = {lu.L.nnz + lu.U.nnz}, residual {res:.1e}, fluxwright's solution differs by {diff:.1e}")
