"""Reads a published file with astropy and prints JSON: for each column its unit, UCD and
description as astropy sees them, and its values (NaN and masked as null).

    /usr/bin/python3 readWithAstropy.py <mode> <file>
mode: ecsv | votable | fits | parquet-keys (a JSON file {key: value} of Parquet key/value metadata)
      | parquet (Table.read itself: needs pyarrow, so run it with a Python that has it)
"""
import io, json, math, sys, warnings

import astropy
from astropy.table import Table, meta
from astropy.io import votable
from astropy.io import fits
import numpy as np

warnings.simplefilter('ignore')
mode, path = sys.argv[1], sys.argv[2]


def cell(v):
    if v is np.ma.masked or v is None:
        return None
    if isinstance(v, (bytes, np.bytes_)):
        v = v.decode()
    if isinstance(v, (np.floating, float)):
        return None if math.isnan(v) else float(v)
    if isinstance(v, (np.integer,)):
        return int(v)
    if isinstance(v, (np.bool_, bool)):
        return bool(v)
    return str(v)


def describe(t):
    cols = {}
    for name in t.colnames:
        c = t[name]
        unit = c.unit
        cols[name] = {
            'unit': None if unit is None else unit.to_string(),
            'ucd': (c.meta or {}).get('ucd'),
            'description': c.description,
            'values': [cell(v) for v in (c.filled(np.nan) if c.dtype.kind == 'f' and hasattr(c, 'filled') else c).tolist()] if c.dtype.kind == 'f' else [cell(v) for v in c],
        }
    return cols


out = {'astropy': astropy.__version__}
if mode == 'ecsv':
    t = Table.read(path, format='ascii.ecsv')
    out['columns'] = describe(t)
    out['meta'] = {k: str(v) for k, v in t.meta.items()}
elif mode == 'votable':
    vt = votable.parse(path)
    tab = vt.get_first_table()
    t = tab.to_table()
    cols = describe(t)
    for f in tab.fields:
        cols[f.name]['ucd'] = f.ucd
    out['columns'] = cols
elif mode == 'fits':
    with fits.open(path) as hdul:
        h = hdul[1].header
        t = Table.read(hdul[1])
        cols = describe(t)
        for i, name in enumerate(t.colnames, start=1):
            cols[name]['ucd'] = h.get(f'TUCD{i}')
            cols[name]['description'] = h.get(f'TCOMM{i}')
        out['columns'] = cols
elif mode == 'parquet-keys':
    kv = json.load(open(path))
    hdr = meta.get_header_from_yaml(kv['table_meta_yaml'].split('\n'))
    out['yaml'] = {c['name']: {'unit': c.get('unit'), 'ucd': (c.get('meta') or {}).get('ucd'), 'description': c.get('description'), 'datatype': c['datatype']} for c in hdr['datatype']}
    out['yaml_meta'] = {k: str(v) for k, v in hdr.get('meta', {}).items()}
    vt = votable.parse(io.BytesIO(kv['IVOA.VOTable-Parquet.content'].encode()))
    tab = vt.get_first_table()
    out['votable_version'] = kv['IVOA.VOTable-Parquet.version']
    out['votable'] = {f.name: {'unit': None if f.unit is None else f.unit.to_string(), 'ucd': f.ucd, 'description': f.description} for f in tab.fields}
elif mode == 'parquet':
    t = Table.read(path, format='parquet')
    out['columns'] = describe(t)
    out['meta'] = {k: str(v) for k, v in t.meta.items()}
    out['dtypes'] = {name: t[name].dtype.str for name in t.colnames}
print(json.dumps(out))
