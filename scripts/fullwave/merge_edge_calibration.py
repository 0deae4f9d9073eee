#!/usr/bin/python3
"""Merges `slotarray calibrate-edge` tables into data/fullwave/edge-slot-calibration.csv: every input's provenance
('#') lines, one header, the rows; a row whose geometry, tilt, depth and frequency an earlier input already gave is
left out (earlier inputs win). Usage: merge_edge_calibration.py OUT IN.csv [IN.csv ...]"""
import sys

out, inputs = sys.argv[1], sys.argv[2:]
header, seen, body = None, set(), []
body.append('# Full-wave (FDTD, openEMS) admittance of inclined narrow-wall (edge) slots: y = Y/G0 at the slot centre, e^(jwt).')
body.append('# Regenerate with scripts/fullwave/edge-calibration.sh. Valid over each family\'s tilts, depths and band (below);')
body.append('# other guides are read by similitude and flagged. The edge-slot model reads this file at build time.')
for path in inputs:
    rows = []
    for line in open(path):
        line = line.rstrip('\n')
        if line.startswith('#'):
            body.append(line + ' [' + path.split('/')[-2] + ']' if line.startswith('# produced by') else line)
            continue
        if header is None:
            header = line
            continue
        if line == header or not line:
            continue
        cols = line.split(',')
        key = tuple(cols[:12])
        if key in seen:
            continue
        seen.add(key)
        rows.append(line)
    body.extend(rows)
lines = [l for l in body if l.startswith('#')] + [header] + [l for l in body if not l.startswith('#')]
with open(out + '.tmp', 'w') as f:
    f.write('\n'.join(lines) + '\n')
import os
os.replace(out + '.tmp', out)
print('wrote', out, len(seen), 'rows')
