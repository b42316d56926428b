# Reads a GDSII file with gdspy (a general-purpose GDSII library) and prints, as JSON: units, cells, the top cell,
# per layer/datatype the polygon count, the largest vertex count and the total area (hierarchy flattened), and labels.
import json
import sys
import warnings

warnings.simplefilter("ignore")
import gdspy

library = gdspy.GdsLibrary(infile=sys.argv[1])
tops = library.top_level()
top = tops[0]
by_spec = top.get_polygons(by_spec=True)
layers = {}
for (layer, datatype), polygons in by_spec.items():
    layers["%d/%d" % (layer, datatype)] = {
        "polygons": len(polygons),
        "maxVertices": max(len(p) for p in polygons),
        "area": float(sum(abs(gdspy.Polygon(p).area()) for p in polygons)),
    }
print("RESULT " + json.dumps({
    "name": library.name,
    "unit": library.unit,
    "precision": library.precision,
    "cells": sorted(library.cell_dict.keys()),
    "tops": [t.name for t in tops],
    "layers": layers,
    "labels": sorted(label.text for label in top.get_labels()),
}))
