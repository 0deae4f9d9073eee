"""Recomputes the [N] check values that the SlotArray tests compare against.

Each value is an independent numpy/scipy evaluation of a published formula (source named beside each function), not a
port of the C# code. Run with Debian's interpreter (needs python3-numpy and python3-scipy):

    /usr/bin/python3 tests/ReferenceData/check_values.py          # closed forms, tapers, coupling, exposure (seconds)
    /usr/bin/python3 tests/ReferenceData/check_values.py --mom    # adds the moment-method regression table (minutes)

All lengths in metres unless a name ends in _mm. Reference case: WR-90 (a = 22.86 mm, b = 10.16 mm) at 9.375 GHz.
"""
import math, sys
import numpy as np
from scipy.special import sici, i0
from scipy.integrate import quad
from scipy.optimize import brentq
from scipy.signal import windows

C0 = 299792458.0
MU0 = 4e-7 * math.pi
ETA0 = MU0 * C0          # 376.7303 ohm
R_D = 73.0               # half-wave dipole radiation resistance used by Stevenson
ETA_S = 120 * math.pi    # impedance of free space used by Stevenson

# ---- TE10 rectangular waveguide: Pozar, Microwave Engineering, 4th ed., 2012, Sec. 3.3, eq. 3.96 ----
def te10(a, b, f, sigma=5.8e7, e_bd=3e6):
    lam = C0 / f; k = 2 * math.pi / lam; fc = C0 / (2 * a)
    beta = math.sqrt(k * k - (math.pi / a) ** 2); lg = 2 * math.pi / beta
    z = ETA0 * k / beta
    rs = math.sqrt(math.pi * f * MU0 / sigma)
    ac = rs / (a ** 3 * b * beta * k * ETA0) * (2 * b * math.pi ** 2 + a ** 3 * k ** 2)
    p = a * b * e_bd ** 2 / (4 * z)
    return dict(lam=lam, fc=fc, lg=lg, beta=beta, Z_TE=z, Rs=rs, alpha_Np=ac,
                alpha_dB=ac * 20 / math.log(10), Pmax=p)

# ---- resonant slot conductances: Stevenson, J. Appl. Phys. 19, 24-38, 1948 (forms as in Silver 1949, pp. 291-295) ----
def guide(a, f):
    lam = C0 / f; lg = 1 / math.sqrt(1 / lam ** 2 - 1 / (2 * a) ** 2); return lam, lg

def g_longitudinal(a, b, f, x):          # x = offset of slot centre line from guide centre line
    lam, lg = guide(a, f)
    return 480 / (math.pi * R_D) * (a / b) * (lg / lam) * math.cos(math.pi * lam / (2 * lg)) ** 2 * math.sin(math.pi * x / a) ** 2

def _c(u):                                # cos(pi u/2)/(1-u^2), removable point u=+-1 -> pi/4
    return math.pi / 4 if abs(abs(u) - 1) < 1e-9 else math.cos(math.pi * u / 2) / (1 - u * u)

def r_inclined_series(a, b, f, th):       # centred slot rotated th from guide axis
    lam, lg = guide(a, f)
    xi = (lam / lg) * math.cos(th) + (lam / (2 * a)) * math.sin(th)
    ze = (lam / lg) * math.cos(th) - (lam / (2 * a)) * math.sin(th)
    I = _c(ze) + _c(xi); J = _c(ze) - _c(xi)
    return 30 / (math.pi * R_D) * lam ** 3 / (a * b * lg) * (I * math.sin(th) + lg / (2 * a) * J * math.cos(th)) ** 2

def r_transverse_series(a, b, f, x):
    lam, lg = guide(a, f)
    return 120 / (math.pi * R_D) * (lg / lam) ** 3 * lam ** 2 / (a * b) * math.cos(math.pi * lam / (4 * a)) ** 2 * math.cos(math.pi * x / a) ** 2

def g_edge(a, b, f, th):                  # narrow-wall slot tilted th from the transverse direction
    lam, lg = guide(a, f); q = lam * math.sin(th) / lg
    return 30 / (math.pi * R_D) * lam ** 3 * lg / (a ** 3 * b) * (math.sin(th) * math.cos(math.pi * q / 2) / (1 - q * q)) ** 2

# ---- dipole mutual impedance, induced EMF (Carter 1932; Balanis, Antenna Theory, 3rd ed., Sec. 8.6) ----
def z21_side_by_side(d_over_lam, L_over_lam=0.5, eta=ETA0):
    k = 2 * math.pi; d = d_over_lam; L = L_over_lam
    u0 = k * d; u1 = k * (math.sqrt(d * d + L * L) + L); u2 = k * (math.sqrt(d * d + L * L) - L)
    Si = lambda x: sici(x)[0]; Ci = lambda x: sici(x)[1]
    return complex(eta / (4 * math.pi) * (2 * Ci(u0) - Ci(u1) - Ci(u2)),
                   -eta / (4 * math.pi) * (2 * Si(u0) - Si(u1) - Si(u2)))

def z21_general(d, s, h=0.25, eta=ETA0):
    """Parallel z-directed dipoles, half-length h, lateral distance d, centre stagger s (all in wavelengths)."""
    k = 2 * math.pi
    def ez(z):
        r1 = math.sqrt(d * d + (z - h) ** 2); r2 = math.sqrt(d * d + (z + h) ** 2); r = math.sqrt(d * d + z * z)
        return -1j * eta / (4 * math.pi) * (np.exp(-1j * k * r1) / r1 + np.exp(-1j * k * r2) / r2 - 2 * math.cos(k * h) * np.exp(-1j * k * r) / r)
    fr = lambda z: (ez(z) * math.sin(k * (h - abs(z - s)))).real
    fi = lambda z: (ez(z) * math.sin(k * (h - abs(z - s)))).imag
    return -complex(quad(fr, s - h, s + h, limit=400, points=[s])[0], quad(fi, s - h, s + h, limit=400, points=[s])[0])

# ---- tapers: Taylor 1955, Dolph 1946, Villeneuve 1984, Bayliss 1968, Taylor 1953 one-parameter ----
def taylor_nbar(sll_db, nbar):
    A = math.acosh(10 ** (sll_db / 20)) / math.pi
    sig = nbar / math.sqrt(A * A + (nbar - 0.5) ** 2)
    zn = [sig * math.sqrt(A * A + (n - 0.5) ** 2) for n in range(1, nbar)]
    F = []
    for m in range(1, nbar):
        num = (-1) ** (m + 1) * np.prod([1 - m * m / z ** 2 for z in zn])
        den = 2 * np.prod([1 - m * m / n ** 2 for n in range(1, nbar) if n != m])
        F.append(num / den)
    return A, sig, np.array(zn), np.array(F)

def taylor_sampled(N, nbar, sll_db):      # equals scipy.signal.windows.taylor(N, nbar, sll_db, norm=False)
    A, sig, zn, F = taylor_nbar(sll_db, nbar)
    x = (np.arange(N) - (N - 1) / 2) / N
    return 1 + 2 * sum(F[m - 1] * np.cos(2 * np.pi * m * x) for m in range(1, nbar))

def chebyshev(N, sll_db):                 # equals scipy.signal.windows.chebwin(N, sll_db)
    R = 10 ** (sll_db / 20); x0 = math.cosh(math.acosh(R) / (N - 1))
    q = np.arange(N); psi = 2 * np.pi * q / N; xs = x0 * np.cos(psi / 2)
    T = np.where(np.abs(xs) <= 1, np.cos((N - 1) * np.arccos(np.clip(xs, -1, 1))),
                 np.sign(xs) ** (N - 1) * np.cosh((N - 1) * np.arccosh(np.maximum(np.abs(xs), 1))))
    xn = np.arange(N) - (N - 1) / 2
    w = np.real(np.array([np.sum(T * np.exp(-1j * v * psi)) for v in xn]) / N)
    return w / w.max()

def villeneuve(N, nbar, sll_db):
    R = 10 ** (sll_db / 20); x0 = math.cosh(math.acosh(R) / (N - 1))
    pc = lambda p: 2 * math.acos(math.cos((2 * p - 1) * math.pi / (2 * (N - 1))) / x0)
    sig = (2 * math.pi * nbar / N) / pc(nbar)
    roots = []
    for p in range(1, N // 2 + 1):
        ps = sig * pc(p) if p < nbar else 2 * math.pi * p / N
        if N % 2 == 0 and p == N // 2: roots.append(np.exp(1j * ps))
        else: roots += [np.exp(1j * ps), np.exp(-1j * ps)]
    w = np.real(np.poly(roots)); return w / np.max(np.abs(w)), sig

BAYLISS = {'A': (0.30387530, -0.05042922, -0.00027989, -0.00000343, -0.00000002),
           'xi1': (0.98583020, -0.03338850, 0.00014064, 0.00000190, 0.00000001),
           'xi2': (2.00337487, -0.01141548, 0.00041590, 0.00000373, 0.00000001),
           'xi3': (3.00636321, -0.00683394, 0.00029281, 0.00000161, 0.0),
           'xi4': (4.00518423, -0.00501795, 0.00021735, 0.00000088, 0.0),
           'p0': (0.47972120, -0.01456692, -0.00018739, -0.00000218, -0.00000001)}

def bayliss_param(name, sll_db_positive):
    S = -abs(sll_db_positive); c = BAYLISS[name]
    return c[0] + S * (c[1] + S * (c[2] + S * (c[3] + S * c[4])))

def bayliss(sll_db, nbar):
    A = bayliss_param('A', sll_db); xi = [bayliss_param('xi%d' % i, sll_db) for i in range(1, 5)]
    z = [xi[n - 1] if n <= 4 else math.sqrt(A * A + n * n) for n in range(1, nbar + 1)]
    sig = (nbar + 0.5) / z[nbar - 1]
    Bm = []
    for m in range(nbar):
        um = m + 0.5
        num = np.prod([1 - (um / (sig * z[n - 1])) ** 2 for n in range(1, nbar)])
        den = np.prod([1 - (um / (n + 0.5)) ** 2 for n in range(nbar) if n != m])
        Bm.append((-1) ** m * um * um * num / den)
    return A, xi, sig, np.array(Bm)   # g(p) = sum_m Bm sin((m+1/2) p), p = 2*pi*x/L

def onepar_B(sll_db):
    return brentq(lambda B: 20 * math.log10(math.sinh(math.pi * B) / (math.pi * B) / 0.2172336) - sll_db, 1e-6, 5)

# ---- Galerkin moment method, longitudinal broad-wall slot, zero wall thickness (after Stern & Elliott 1985) ----
# Exterior kernel with the equivalent strip radius w/4 (Butler 1982).
def slot_admittance(a, b, f, xo, L, w, P=5, M=300, N=300, ng=280):
    k = 2 * math.pi * f / C0; om = 2 * math.pi * f; l = L / 2; xc = a / 2 + xo
    beta = math.sqrt(k * k - (math.pi / a) ** 2)
    ps = np.arange(1, P + 1); al = ps * math.pi / (2 * l)
    m = np.arange(0, M + 1)[:, None]; n = np.arange(0, N + 1)[None, :]
    em = np.where(m == 0, 1.0, 2.0); en = np.where(n == 0, 1.0, 2.0)
    kc2 = (m * math.pi / a) ** 2 + (n * math.pi / b) ** 2; g2 = kc2 - k * k
    gam = np.where(g2 >= 0, np.sqrt(np.abs(g2)) + 0j, 1j * np.sqrt(np.abs(g2)))
    xm = m * math.pi / a
    sincm = np.where(m == 0, 1.0, np.sin(xm * w / 2) / np.where(m == 0, 1, xm * w / 2))
    pref = (em * en / (a * b)) * w * np.cos(xm * xc) ** 2 * sincm ** 2 / (1j * om * MU0)
    E = np.exp(-gam * L)
    Zi = np.zeros((P, P), complex)
    for iq, q in enumerate(ps):
        for ip, p in enumerate(ps):
            if (p + q) % 2: continue
            s = (-1) ** p
            D = (l / (al[ip] ** 2 + gam ** 2) if p == q else 0.0) + (1 - s * E) * al[iq] * al[ip] / (gam * (al[iq] ** 2 + gam ** 2) * (al[ip] ** 2 + gam ** 2))
            Zi[iq, ip] = np.sum(pref * (kc2 * D - (l if p == q else 0.0)))
    xg, wg = np.polynomial.legendre.leggauss(ng); z = l * xg; wz = l * wg
    fz = np.array([np.sin(u * (z + l)) for u in al]); fpz = np.array([u * np.cos(u * (z + l)) for u in al])
    R = np.sqrt((z[:, None] - z[None, :]) ** 2 + (w / 4) ** 2); G = np.exp(-1j * k * R) / (4 * math.pi * R)
    W = wz[:, None] * wz[None, :]
    Ze = np.array([[(2 * w / (1j * om * MU0)) * np.sum(W * G * (k * k * np.outer(fz[i], fz[j]) - np.outer(fpz[i], fpz[j])))
                    for j in range(P)] for i in range(P)])
    c1 = math.cos(math.pi * xc / a); s1 = math.sin(math.pi * w / (2 * a)) / (math.pi * w / (2 * a))
    Pm = fz @ (wz * np.exp(-1j * beta * z)); Pp = fz @ (wz * np.exp(1j * beta * z))
    V = np.linalg.solve(Ze + Zi, (1j * math.pi / (om * MU0 * a)) * w * c1 * s1 * Pm)
    B = -1j * (math.pi / (a * a * b * beta)) * c1 * s1 * np.sum(V * Pm)
    Cf = -1j * (math.pi / (a * a * b * beta)) * c1 * s1 * np.sum(V * Pp)
    return -2 * B / (1 + B), B, Cf


# ---- travelling-wave arrays: Elliott, Antenna Theory and Design, 1981, Ch. 8 (small-g form) ----
def tw_beam_deg(a, f, d, alternating=True):
    lam, lg = guide(a, f)
    return math.degrees(math.asin(lam / lg - lam / (2 * d) if alternating else lam / lg - lam / d))

def small_g(powers, p_load):
    g, left = [], p_load + sum(powers)
    for p in powers:
        g.append(p / left); left -= p
    return np.array(g)

# ---- exposure: ICNIRP 2020 Table 6; Friis 1946; FCC OET Bulletin 65 (1997) ----
def icnirp_local(f_ghz):
    return 55 / f_ghz ** 0.177, 275 / f_ghz ** 0.177

if __name__ == '__main__':
    a, b, f = 0.02286, 0.01016, 9.375e9
    t = te10(a, b, f)
    print('TE10 WR-90 9.375 GHz: fc %.6f GHz, lambda_g %.5f mm, Z_TE %.3f ohm, alpha %.7f Np/m, Pmax %.4f MW'
          % (t['fc'] / 1e9, t['lg'] * 1e3, t['Z_TE'], t['alpha_Np'], t['Pmax'] / 1e6))
    t = te10(a, b, 10e9)
    print('TE10 WR-90 10 GHz   : lambda_g %.5f mm, alpha %.7f Np/m = %.6f dB/m' % (t['lg'] * 1e3, t['alpha_Np'], t['alpha_dB']))
    print('Stevenson g(x = 2.54 mm) = %.5f; coefficient %.6f' % (g_longitudinal(a, b, f, 2.54e-3), g_longitudinal(a, b, f, a / 2)))
    print('Stevenson x(g = 0.10) = %.4f mm' % (a / math.pi * math.asin(math.sqrt(0.10 / g_longitudinal(a, b, f, a / 2))) * 1e3))
    print('edge slot g(15 deg) = %.5f; inclined series r(15 deg) = %.5f; transverse r = %.5f'
          % (g_edge(a, b, f, math.radians(15)), r_inclined_series(a, b, f, math.radians(15)), r_transverse_series(a, b, f, 0.0)))
    print('Z21 side by side d = 0.5 lambda:', z21_side_by_side(0.5))
    print('Z21 collinear touching (s = 0.5 lambda):', z21_general(1e-6, 0.5))
    print('thin half-wave dipole self impedance:', z21_general(1e-5, 0.0))
    for s in (20, 25, 30, 35, 40):
        print('Taylor A(%d dB) = %.6f' % (s, taylor_nbar(s, 4)[0]))
    print('Taylor sigma(30 dB, nbar 4/6) = %.6f / %.6f' % (taylor_nbar(30, 4)[1], taylor_nbar(30, 6)[1]))
    print('taylor_sampled(16, 4, 30) =', np.round(taylor_sampled(16, 4, 30)[:8], 6),
          ' max|diff scipy| = %.1e' % np.max(np.abs(taylor_sampled(16, 4, 30) - windows.taylor(16, 4, 30, norm=False))))
    print('chebwin(8, 30) =', np.round(chebyshev(8, 30)[:4], 6),
          ' max|diff scipy| = %.1e' % np.max(np.abs(chebyshev(16, 30) - windows.chebwin(16, 30))))
    w, sig = villeneuve(16, 4, 30); print('Villeneuve N = 16, nbar 4, 30 dB: sigma %.6f, edge %.6f' % (sig, w[0]))
    A, xi, sig, Bm = bayliss(30, 6); print('Bayliss 30 dB: A %.7f, xi1 %.7f, sigma(nbar 6) %.6f' % (A, xi[0], sig))
    print('Taylor one-parameter B(30 dB) = %.5f' % onepar_B(30))
    lam, lg = guide(a, f)
    print('lambda_g/2 = %.4f mm; travelling-wave beam, d = 21 mm: %.3f deg' % (lg / 2 * 1e3, tw_beam_deg(a, f, 0.021)))
    wt = taylor_sampled(16, 4, 30); P = wt ** 2 / np.sum(wt ** 2) * 0.95
    print('small-g conductances, Taylor 30/4, N = 16, P_L = 0.05:', np.round(small_g(P, 0.05), 5))
    gp, occ = icnirp_local(9.41); print('ICNIRP 2020 local, 9.41 GHz: %.2f / %.2f W/m2' % (gp, occ))
    print('Friis S(12.5 W, 30 dBi, 10 m) = %.3f W/m2; 2D^2/lambda(2.4 m, 9.41 GHz) = %.1f m; 4P/A = %.1f W/m2'
          % (12.5 * 1000 / (4 * math.pi * 100), 2 * 2.4 ** 2 / (C0 / 9.41e9), 4 * 12.5 / (2.4 * 0.15)))
    print('equal-area round end, w = 1.5875 mm: L_o - L_eq = %.4f mm' % ((1 - math.pi / 4) * 1.5875))
    if '--mom' in sys.argv:
        lam = C0 / f
        for xo in (1e-3, 2e-3, 3e-3, 4e-3, 5e-3):
            Lr = brentq(lambda L: slot_admittance(a, b, f, xo, L, 1.5875e-3)[0].imag, 0.44 * lam, 0.56 * lam, xtol=1e-7)
            y = slot_admittance(a, b, f, xo, Lr, 1.5875e-3)[0]
            print('MoM offset %.1f mm: 2l_r = %.4f mm (%.5f lambda), g_r = %.5f, Stevenson %.5f'
                  % (xo * 1e3, Lr * 1e3, Lr / lam, y.real, g_longitudinal(a, b, f, xo)))
