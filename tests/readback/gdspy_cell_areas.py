# Reads a GDSII file with gdspy (a general-purpose GDSII library) and prints, as JSON, per cell and per
# layer/datatype the total polygon area of that cell alone (its references not expanded), the labels of
# the top cell (hierarchy flattened), and which cells the top cell places, with how many instances each.
import json
import sys
import warnings

warnings.simplefilter("ignore")
import gdspy

library = gdspy.GdsLibrary(infile=sys.argv[1])
top = library.top_level()[0]
cells = {}
for name, cell in library.cell_dict.items():
    layers = {}
    for polygon in cell.polygons:
        for points, layer, datatype in zip(polygon.polygons, polygon.layers, polygon.datatypes):
            key = "%d/%d" % (layer, datatype)
            layers[key] = layers.get(key, 0.0) + abs(float(gdspy.Polygon(points).area()))
    cells[name] = layers
placed = {}
for reference in top.references:
    name = reference.ref_cell.name if hasattr(reference.ref_cell, "name") else str(reference.ref_cell)
    count = reference.columns * reference.rows if isinstance(reference, gdspy.CellArray) else 1
    placed[name] = placed.get(name, 0) + int(count)
print("RESULT " + json.dumps({
    "cells": cells,
    "placed": placed,
    "labels": sorted(label.text for label in top.get_labels()),
}))
