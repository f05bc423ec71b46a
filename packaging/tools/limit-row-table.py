#!/usr/bin/env python3
# Prints the row-audit table of core/src/limits/README.md from the row sources. Run from the project root after
# editing rows; the core suite checks that the README names every row.
import re,sys
rows=[]
for f in ['core/src/limits/rows_shared.cpp','core/src/limits/rows_edition.cpp']:
    s=open(f).read()
    for m in re.finditer(r'\{"([^"]+)", (Eye|Skin),\s+(?:Effect::)?(\w+),\s+([\d.e]+),\s+([\d.e]+),\s+([\d.e-]+|kFar),\s+([\d.e-]+|kFar|3e4),\s+(\w+),\s+(\w+),\s+([\d.e-]+),\s+([\d.e-]+),\s+([\w| ]+),\s+(\w+),\s+"([^"]*)",\s+"([^"]*)"\}', s, re.S):
        rows.append((f,)+m.groups())
print(len(rows), file=sys.stderr)
def sets(f,rid):
    if 'shared' in f: return '2007, 2014'
    return None
out=[]
for r in rows:
    f,rid,tgt,eff,l0,l1,t0,t1,src,kind,k,p,fac,st,formula,source=r
    t1='3e4' if t1=='kFar' else t1
    if 'shared' in f: which='both'
    else: which=None
    out.append((rid,tgt,eff,l0,l1,t0,t1,src,formula,st,source,f))
import collections
print('| rule sets | row id | target | effect | nm | s | source size | limit | status (2007 data) | source |')
print('|---|---|---|---|---|---|---|---|---|---|')
for (rid,tgt,eff,l0,l1,t0,t1,src,formula,st,source,f) in out:
    if 'shared' in f: w='2007 + 2014'
    else:
        w='2014' if ('2014' in source or 'L10' in source) else '2007'
    t0s='< 1e-13 (below table) …' if t0=='0' else t0
    print(f'| {w} | `{rid}` | {tgt.lower()} | {eff} | {l0}–{l1} | {t0s}–{t1} | {src.lower()} | {formula} | {st} | {source} |')
