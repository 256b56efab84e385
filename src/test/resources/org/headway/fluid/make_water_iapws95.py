#!/usr/bin/python3
"""Writes water-iapws95-1atm.csv: liquid water at 0.101325 MPa, 0-99 degC, by the IAPWS-95
scientific formulation (density), the IAPWS 2008 viscosity at that density, and the saturation pressure of the IAPWS 1992
supplementary release on saturation properties (Wagner and Pruss), as computed by the general-purpose Python library `iapws` (Debian package
python3-iapws). Run: /usr/bin/python3 make_water_iapws95.py > water-iapws95-1atm.csv"""
import iapws
from iapws import IAPWS95
from iapws._iapws import _Viscosity

print("# Liquid water at p = 0.101325 MPa by IAPWS-95 (IAPWS R6-95(2018)), viscosity by IAPWS R12-08 at the")
print("# IAPWS-95 density, saturation pressure by the IAPWS 1992 supplementary release (Eq. 1), computed with the Python")
print(f"# library iapws {iapws.__version__} (Debian python3-iapws) by make_water_iapws95.py; printed to 9 significant digits.")
print("celsius,density_kg_per_m3,viscosity_pa_s,vapour_pressure_pa")
for c in list(range(0, 100, 5)) + [99]:
    t = 273.15 + c
    w = IAPWS95(T=t, P=0.101325)
    mu = _Viscosity(w.rho, t)
    print(f"{c},{w.rho:.9g},{mu:.9g},{IAPWS95._Vapor_Pressure(t) * 1e6:.9g}")
