#!/usr/bin/python3
"""Reads an openEMS model file back with CSXCAD (Debian python3-openems) and prints, for each point "x y z" (mm) on
stdin, the name of the property that owns it (the highest-priority primitive there), or "-" for the background.
The first line of output counts the properties and primitives read. Used by the FullWave tests as an independent
reader of the geometry this project writes."""
import os
import sys
import tempfile
import xml.etree.ElementTree as ET

from CSXCAD import ContinuousStructure

# CSXCAD reads a file whose root is the ContinuousStructure; the engine's file wraps it in <openEMS>.
structure = ET.parse(sys.argv[1]).getroot().find('ContinuousStructure')
tmp = tempfile.NamedTemporaryFile('wb', suffix='.xml', delete=False)
tmp.write(ET.tostring(structure))
tmp.close()
csx = ContinuousStructure()
csx.ReadFromXML(tmp.name)
os.unlink(tmp.name)
print('properties', csx.GetQtyProperties(), 'primitives', len(csx.GetAllPrimitives()))
for line in sys.stdin:
    if not line.strip():
        continue
    prop = csx.GetPropertyByCoordPriority([float(v) for v in line.split()], markFoundAsUsed=False)
    print(prop.GetName() if prop is not None else '-')
