#!/usr/bin/python3
"""Writes two seawater reference tables computed with general-purpose libraries (Debian packages):
  seawater-teos10-density.csv  density at atmospheric pressure by TEOS-10 (IOC, SCOR and IAPSO 2010),
                               library gsw (python3-gsw): gsw.rho(SA, CT_from_t(SA, t, 0), 0);
  seawater-iapws08-boiling.csv boiling temperature of seawater at a given pressure by IAPWS R13-08
                               with IAPWS-95, library iapws (python3-iapws): iapws.iapws08._Tb(P, S).
Run: /usr/bin/python3 make_seawater_references.py (writes both files here). 9 significant digits."""
import gsw
import iapws
from iapws.iapws08 import _Tb

with open("seawater-teos10-density.csv", "w") as f:
    f.write("# Seawater density at sea pressure 0 dbar (101325 Pa absolute) by TEOS-10, computed with the Python\n")
    f.write(f"# library gsw {gsw.__version__} (Debian python3-gsw) by make_seawater_references.py; 9 significant digits.\n")
    f.write("# Absolute salinity SA (g/kg) is taken equal to the salinity S of Sharqawy et al. 2010.\n")
    f.write("celsius,salinity_g_per_kg,density_kg_per_m3\n")
    for sa in (10, 20, 35, 40):
        for t in range(0, 41, 5):
            ct = gsw.CT_from_t(sa, t, 0)
            f.write(f"{t},{sa},{float(gsw.rho(sa, ct, 0)):.9g}\n")

with open("seawater-iapws08-boiling.csv", "w") as f:
    f.write("# Boiling temperature of seawater at absolute pressure P by IAPWS R13-08 (seawater) with IAPWS-95 (water),\n")
    f.write(f"# computed with the Python library iapws {iapws.__version__} (Debian python3-iapws), function iapws08._Tb,\n")
    f.write("# by make_seawater_references.py; 9 significant digits. At that temperature the vapour pressure equals P.\n")
    f.write("# Rows kept inside the range where the library raised no out-of-range warning (up to about 77 degC).\n")
    f.write("pressure_pa,salinity_g_per_kg,boiling_temperature_k\n")
    for p in (5000, 10000, 20000, 40000):
        for s in (10, 35, 70):
            f.write(f"{p},{s},{_Tb(p / 1e6, s / 1000):.9g}\n")
