#!/usr/bin/env python3
"""Independent computation of the sample jobs' values that no published table prints directly.

Written apart from Hobwright's Java code, from the textbook relations only (ISO 21771 geometry,
the base tangent length W_k, measurement over two pins, Newton's inverse of the involute function),
so it cannot share a bug with it. Run `python3 reference_values.py`; SampleJobNumbersTest quotes
its output. The helical worked example of the domain notes is printed first as a check of this
script itself (d_a 66.9166, W_5 27.7705, over balls 67.7794).
"""
from math import acos, asin, atan, cos, degrees, pi, radians, sin, tan


def inv(a):
    return tan(a) - a


def inv_inverse(q):
    a = (3 * q) ** (1 / 3)
    for _ in range(50):
        a -= (tan(a) - a - q) / tan(a) ** 2
    return a


def gear(z, mn, alpha_deg=20.0, beta_deg=0.0, x=0.0, dedendum=1.25, esn=0.0, pin=None):
    an, b = radians(alpha_deg), radians(beta_deg)
    at = atan(tan(an) / cos(b))
    d = z * mn / cos(b)
    db = d * cos(at)
    bb = asin(sin(b) * cos(an))
    da = d + 2 * (x * mn + mn)
    df = d - 2 * (dedendum * mn - x * mn)
    xe = x + esn / (2 * mn * tan(an))
    am = acos(db / (d + 2 * x * mn))
    k_calc = (z / pi) * (tan(am) / cos(bb) ** 2 - inv(at)) - 2 * x * tan(an) / pi + 0.5
    k = max(1, round(k_calc))
    w = mn * cos(an) * ((k - 0.5) * pi + z * inv(at)) + 2 * xe * mn * sin(an)
    out = {"d": d, "d_b": db, "d_a": da, "d_f": df, "k": k, "W_k": w}
    if pin:
        q = pin / (z * mn * cos(an)) - pi / (2 * z) + inv(at) + 2 * x * tan(an) / z + esn / (z * mn)
        dmt = db / cos(inv_inverse(q))
        out["M_d"] = dmt + pin if z % 2 == 0 else dmt * cos(pi / 2 / z) + pin
    return out


def show(name, values):
    print(name)
    for key, value in values.items():
        print("   %-4s %.6f" % (key, value) if isinstance(value, float) else "   %-4s %d" % (key, value))


show("check: domain helical example m_n 2, z 30, beta 15, x 0.2, ball 3.5", gear(30, 2, beta_deg=15, x=0.2, pin=3.5))
show("metering-pump-gear: z 24, m 1, E_sn -0.03, pin 1.75", gear(24, 1, esn=-0.03, pin=1.75))
show("metering-pump-gear nominal tooth (E_sn 0)", gear(24, 1, pin=1.75))
show("dosing-pinion-z12-shifted: z 12, m 0.8, x 0.3, pin 1.4", gear(12, 0.8, x=0.3, pin=1.4))
print("x_min for z 12 (h* = 1):", 1 - 12 * sin(radians(20)) ** 2 / 2)
show("pump-helical-gear: m_n 0.8, z 30, beta 15, x 0.2, ball 1.4", gear(30, 0.8, beta_deg=15, x=0.2, pin=1.4))
