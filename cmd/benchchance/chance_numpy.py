"""The Monte Carlo of `cleft chance`, vectorised with numpy, for the
benchmark command beside it (go run ./cmd/benchchance): the same inputs and
distributions (the example of issue 12), the same number of realisations
and planes, the same outputs per plane (P(critical), P(opening),
percentiles of FS, Ts and pressure to slip, Spearman's rho with every
input). Random numbers come from numpy's own generator, so the numbers
agree with cleft's in distribution, not draw for draw.

    python3 chance_numpy.py PLANES.csv REALISATIONS [--fisher K]

PLANES.csv has name,dip,dip_direction,depth,friction (friction may be
empty). Prints the wall and CPU seconds spent after reading the table.
"""
import csv
import sys
import time
import warnings

try:
    import numpy as np
except ImportError:
    print("numpy is not installed: skipped")
    sys.exit(3)

G, GW = 9.81, 0.00981


def norm_ppf(p):
    """Inverse of the standard normal CDF (Acklam's rational approximation,
    relative error 1.15e-9), numpy has none of its own."""
    a = [-3.969683028665376e+01, 2.209460984245205e+02, -2.759285104469687e+02, 1.383577518672690e+02, -3.066479806614716e+01, 2.506628277459239e+00]
    b = [-5.447609879822406e+01, 1.615858368580409e+02, -1.556989798598866e+02, 6.680131188771972e+01, -1.328068155288572e+01]
    c = [-7.784894002430293e-03, -3.223964580411365e-01, -2.400758277161838e+00, -2.549732539343734e+00, 4.374664141464968e+00, 2.938163982698783e+00]
    d = [7.784695709041462e-03, 3.224671290700398e-01, 2.445134137142996e+00, 3.754408661907416e+00]
    p = np.asarray(p, dtype=float)
    x = np.empty_like(p)
    lo, hi = p < 0.02425, p > 1 - 0.02425
    mid = ~(lo | hi)
    q = np.sqrt(-2 * np.log(p[lo]))
    x[lo] = (((((c[0]*q+c[1])*q+c[2])*q+c[3])*q+c[4])*q+c[5]) / ((((d[0]*q+d[1])*q+d[2])*q+d[3])*q+1)
    q = np.sqrt(-2 * np.log(1 - p[hi]))
    x[hi] = -(((((c[0]*q+c[1])*q+c[2])*q+c[3])*q+c[4])*q+c[5]) / ((((d[0]*q+d[1])*q+d[2])*q+d[3])*q+1)
    q = p[mid] - 0.5
    r = q * q
    x[mid] = (((((a[0]*r+a[1])*r+a[2])*r+a[3])*r+a[4])*r+a[5])*q / (((((b[0]*r+b[1])*r+b[2])*r+b[3])*r+b[4])*r+1)
    return x


def draw(n, rng):
    """The seven inputs, n realisations, with rank correlation 0.7 between
    the SHmax and Shmin ratios by Iman & Conover (1982)."""
    x = np.empty((n, 7))
    x[:, 0] = rng.normal(1.35, 0.15, n)                 # stress.shmax.ratio
    x[:, 1] = rng.uniform(110, 146, n)                  # stress.shmax.azimuth
    x[:, 2] = rng.triangular(0.6, 0.72, 0.85, n)        # stress.shmin.ratio
    rho = rng.normal(2650, 50, n)                       # density, truncated
    bad = (rho < 2400) | (rho > 2900)
    while bad.any():                                    # redraw: the same distribution
        rho[bad] = rng.normal(2650, 50, bad.sum())
        bad = (rho < 2400) | (rho > 2900)
    x[:, 3] = rho
    x[:, 4] = rng.uniform(5, 30, n)                     # water.table
    x[:, 5] = 0.6 * np.exp(0.1 * rng.standard_normal(n))  # strength.friction
    x[:, 6] = rng.uniform(0.35, 0.5, n)                 # planes.F1.friction
    # Iman & Conover on the pair (0, 2).
    scores = norm_ppf(np.arange(1, n + 1) / (n + 1))
    r = np.stack([rng.permutation(scores), rng.permutation(scores)], axis=1)
    target = 2 * np.sin(np.pi * 0.7 / 6)
    p = np.linalg.cholesky(np.array([[1, target], [target, 1]])).T
    q = np.linalg.cholesky(np.corrcoef(r, rowvar=False)).T
    s = r @ np.linalg.inv(q) @ p
    for k, col in enumerate((0, 2)):
        vals = np.sort(x[:, col])
        x[np.argsort(s[:, k], kind="stable"), col] = vals
    return x


def ranks(a, axis=-1):
    """Ranks 1..n along axis (ties broken by order)."""
    o = np.argsort(a, axis=axis, kind="stable")
    r = np.empty_like(o)
    shape = [1] * a.ndim
    shape[axis] = a.shape[axis]
    vals = np.broadcast_to(np.arange(1, a.shape[axis] + 1).reshape(shape), o.shape)
    np.put_along_axis(r, o, vals, axis=axis)
    return r.astype(float)


def main():
    path, n = sys.argv[1], int(sys.argv[2])
    kappa = float(sys.argv[4]) if len(sys.argv) > 4 and sys.argv[3] == "--fisher" else 0.0
    with open(path) as f:
        rows = list(csv.DictReader(f))
    warnings.simplefilter("ignore")  # percentiles that fall next to ±inf are nan, as in cleft
    t0, c0 = time.perf_counter(), time.process_time()
    rng = np.random.default_rng(7)
    dip = np.radians([float(r["dip"]) for r in rows])
    dd = np.radians([float(r["dip_direction"]) for r in rows])
    z = np.array([float(r["depth"]) for r in rows])
    own = np.array([r["name"] == "F1" for r in rows])
    pole = np.stack([-np.sin(dip) * np.cos(dd), -np.sin(dip) * np.sin(dd), np.cos(dip)], axis=1)
    x = draw(n, rng)
    xr = ranks(x, axis=0)
    xr -= xr.mean(axis=0)
    xr /= np.sqrt((xr ** 2).sum(axis=0))
    kH, az, kh, dens, table, mu = x[:, 0], np.radians(x[:, 1]), x[:, 2], x[:, 3], x[:, 4], x[:, 5]
    c, s = np.cos(az), np.sin(az)
    out = []
    chunk = 25
    for lo in range(0, len(rows), chunk):
        hi = min(len(rows), lo + chunk)
        zz = z[lo:hi, None]
        sv = dens[None, :] * G * 1e-6 * zz
        sh, sm = kH[None, :] * sv, kh[None, :] * sv
        nn, ee, ne = sh * c * c + sm * s * s, sh * s * s + sm * c * c, (sh - sm) * c * s
        pp = GW * np.maximum(0, zz - table[None, :])
        m = np.where(own[lo:hi, None], x[None, :, 6], mu[None, :])
        n0 = np.broadcast_to(pole[lo:hi, None, :], (hi - lo, n, 3))
        if kappa > 0:
            u, phi = rng.random((hi - lo, n)), 2 * np.pi * rng.random((hi - lo, n))
            ct = 1 + np.log(u + (1 - u) * np.exp(-2 * kappa)) / kappa
            st = np.sqrt(np.maximum(0, 1 - ct * ct))
            ref = np.where(np.abs(pole[lo:hi, 0:1]) > 0.6, [[0, 1, 0]], [[1, 0, 0]])
            e1 = np.cross(pole[lo:hi], ref)
            e1 /= np.linalg.norm(e1, axis=1, keepdims=True)
            e2 = np.cross(pole[lo:hi], e1)
            n0 = ct[..., None] * pole[lo:hi, None, :] + (st * np.cos(phi))[..., None] * e1[:, None, :] + (st * np.sin(phi))[..., None] * e2[:, None, :]
        nx, ny, nz = n0[..., 0], n0[..., 1], n0[..., 2]
        tx, ty, tz = nn * nx + ne * ny, ne * nx + ee * ny, sv * nz
        sn = tx * nx + ty * ny + tz * nz
        tau = np.sqrt(np.maximum(0, tx * tx + ty * ty + tz * tz - sn * sn))
        en = sn - pp
        opening = en <= 0
        with np.errstate(divide="ignore", invalid="ignore"):
            fs = np.where(opening, -np.inf, m * en / tau)
            ts = np.where(opening, np.inf, tau / en)
        pts = en - tau / m
        crit = ~opening & (fs <= 1)
        pct = [np.percentile(v, [5, 50, 95], axis=1) for v in (fs, ts, pts)]
        rho = (ranks(fs, axis=1) - (n + 1) / 2)
        rho /= np.sqrt((rho ** 2).sum(axis=1, keepdims=True))
        rho = rho @ xr
        out.append((crit.mean(axis=1), opening.mean(axis=1), pct, rho))
    print(f"{time.perf_counter() - t0:.3f} {time.process_time() - c0:.3f}")


if __name__ == "__main__":
    main()
