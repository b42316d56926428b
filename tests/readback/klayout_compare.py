# KLayout batch macro: reads a GDSII and an OASIS file and prints, as JSON, the merged area per layer of
# each top cell (hierarchy flattened), their XOR per layer, polygon and text counts, and the OASIS unit.
# Variables come from `klayout -b -r klayout_compare.py -rd gds=... -rd oas=...`.
import json
import pya

def load(path):
    layout = pya.Layout()
    layout.read(path)
    return layout

def regions(layout):
    top = layout.top_cell()
    out = {}
    for index in layout.layer_indexes():
        info = layout.get_info(index)
        region = pya.Region(top.begin_shapes_rec(index))
        out["%d/%d" % (info.layer, info.datatype)] = region
    return top, out

def texts(layout):
    top = layout.top_cell()
    found = []
    for index in layout.layer_indexes():
        it = top.begin_shapes_rec(index)
        while not it.at_end():
            shape = it.shape()
            if shape.is_text():
                found.append(shape.text_string)
            it.next()
    return sorted(found)

gds_layout = load(gds)
oas_layout = load(oas)
gds_top, gds_regions = regions(gds_layout)
oas_top, oas_regions = regions(oas_layout)
dbu = gds_layout.dbu
result = {
    "gdsTop": gds_top.name,
    "oasTop": oas_top.name,
    "gdsDbu": gds_layout.dbu,
    "oasDbu": oas_layout.dbu,
    "cells": sorted(c.name for c in oas_layout.each_cell()),
    "layers": {},
    "gdsTexts": texts(gds_layout),
    "oasTexts": texts(oas_layout),
}
for key in sorted(set(gds_regions) | set(oas_regions)):
    g = gds_regions.get(key, pya.Region())
    o = oas_regions.get(key, pya.Region())
    result["layers"][key] = {
        "gdsArea": g.area() * dbu * dbu,
        "oasArea": o.area() * dbu * dbu,
        "gdsPolygons": g.count(),
        "oasPolygons": o.count(),
        "xorEmpty": (g ^ o).is_empty(),
    }
print("RESULT " + json.dumps(result))
