#!/usr/bin/python3
"""Geometry steps of test-charts/make-charts.sh (run it through that script, not alone).

Sub-commands:
  world-split   validate Natural Earth land (GeoJSON from ogr2ogr) and cut it on a grid
  demo-assemble turn the open shoreline pieces that `gmt coast -M -W` prints into closed
                land (and lake) polygons, plus merged coastline lines
  check-demo    compare the demo land with Natural Earth land; check every island
  probes        choose and verify land/sea probe points for the renderer's pixel tests
  expected      record what ogrinfo/ogr2ogr say about a list of files (EXPECTED.tsv)

Geometry: Shapely (GEOS), reading and writing through GDAL/OGR (osgeo.ogr) or GeoJSON text
that ogr2ogr converts.  Areas in km2 are taken on a Lambert azimuthal equal-area projection
centred on the region (PROJ through osgeo.osr), so they are true areas on the WGS84 ellipsoid
to well under 0.1 % over a few degrees.
"""
import argparse
import json
import math
import re
import subprocess
import sys
import unicodedata
import warnings

from osgeo import ogr, osr
from shapely import wkb as shp_wkb
from shapely.geometry import (GeometryCollection, LineString, MultiLineString, MultiPolygon,
                              Point, Polygon, box, mapping, shape)
from shapely.ops import linemerge, polygonize_full, unary_union
from shapely.prepared import prep
from shapely.strtree import STRtree
from shapely.validation import explain_validity, make_valid

ogr.UseExceptions()
# Shapely 1.8 (Debian bookworm) warns about its 2.0 STRtree API; the calls here work on both.
warnings.filterwarnings("ignore", message="STRtree will be changed")
osr.UseExceptions()

# Islands of the central and eastern Azores groups inside the demo region.  The points are
# approximate island centres written from memory; they serve only to name the polygons and
# to make sure none is missing (the check fails if a point is not on land).  The Formigas
# islets (with the Dollabarat reef) are too small for a point, so they are named by a box.
DEMO_ISLANDS = [
    # name, lat, lon (from memory, approximate)
    ("Faial", 38.58, -28.71),
    ("Pico", 38.47, -28.40),
    ("São Jorge", 38.65, -28.07),
    ("Graciosa", 39.05, -28.01),
    ("Terceira", 38.72, -27.22),
    ("São Miguel", 37.78, -25.50),
    ("Santa Maria", 36.97, -25.10),
]
FORMIGAS_BOX = (-24.80, 37.20, -24.70, 37.30)  # lon_min, lat_min, lon_max, lat_max (from memory)

# World probe points: continent interiors and mid-ocean, chosen by hand and verified below
# against the world land (at least WORLD_PROBE_MARGIN_DEG from any coast).
WORLD_PROBES = [
    # (off the 10 deg cell edges of world-base.gpkg, where a point is on no piece's inside)
    ("world-land-africa-chad", 15.5, 19.5, "land"),
    ("world-land-asia-siberia", 62.5, 101.5, "land"),
    ("world-land-australia", -24.5, 134.5, "land"),
    ("world-sea-north-atlantic", 30.5, -44.5, "sea"),
    ("world-sea-south-pacific", -40.5, -119.5, "sea"),
    ("world-sea-indian-ocean", -30.5, 80.5, "sea"),
]
WORLD_PROBE_MARGIN_DEG = 2.0

# Probe points must be at least this far (in degrees of lat/lon, as the brief asks) from any
# coastline, so that a renderer that is off by a pixel or two at chart scale still agrees.
PROBE_MIN_COAST_DEG = 0.01
# Sea probes are taken in open water, further out than that: 0.05 deg is about 3 nm.
PROBE_SEA_OPEN_DEG = 0.05
PROBE_ROUND_DIGITS = 4  # 1e-4 deg is about 11 m


def fail(msg):
    print("FAIL: " + msg, file=sys.stderr)
    sys.exit(1)


def polygonal_parts(geom):
    """Polygons in geom (make_valid may return collections with lines or points)."""
    if geom.is_empty:
        return []
    if isinstance(geom, Polygon):
        return [geom]
    if isinstance(geom, MultiPolygon):
        return list(geom.geoms)
    if isinstance(geom, GeometryCollection):
        out = []
        for g in geom.geoms:
            out.extend(polygonal_parts(g))
        return out
    return []


def read_geojson(path):
    with open(path, encoding="utf-8") as f:
        return json.load(f)


def write_geojson(path, features):
    fc = {"type": "FeatureCollection",
          "crs": {"type": "name", "properties": {"name": "urn:ogc:def:crs:OGC:1.3:CRS84"}},
          "features": features}
    with open(path, "w", encoding="utf-8") as f:
        json.dump(fc, f, ensure_ascii=False)


def feature(geom, props):
    return {"type": "Feature", "properties": props, "geometry": mapping(geom)}


def read_ogr_layer(path, layer, bbox=None):
    """Shapely geometries and attributes of one OGR layer (lon/lat order)."""
    ds = ogr.Open(path)
    lyr = ds.GetLayerByName(layer)
    if lyr is None:
        fail(f"{path}: no layer '{layer}'")
    if bbox is not None:
        lyr.SetSpatialFilterRect(*bbox)
    out = []
    for f in lyr:
        g = f.GetGeometryRef()
        if g is None:
            continue
        out.append((shp_wkb.loads(bytes(g.ExportToIsoWkb())), f.items(), f.GetFID(), g.Clone()))
    return out


EARTH_LAND_AREA_KM2 = 148.9e6  # from memory (encyclopaedia figure), used as a sanity bound


def wgs84_lonlat():
    src = osr.SpatialReference()
    src.ImportFromEPSG(4326)
    src.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    return src


def proj(text):
    dst = osr.SpatialReference()
    dst.ImportFromProj4(text)
    return dst


def equal_area_transform(lon0, lat0):
    return osr.CoordinateTransformation(
        wgs84_lonlat(), proj(f"+proj=laea +lat_0={lat0} +lon_0={lon0} +datum=WGS84 +units=m"))


def to_equal_area(geom, ct):
    g = ogr.CreateGeometryFromWkb(geom.wkb)
    g.Transform(ct)
    return shp_wkb.loads(bytes(g.ExportToIsoWkb()))


def slug(name):
    s = unicodedata.normalize("NFKD", name).encode("ascii", "ignore").decode()
    return re.sub(r"[^a-z0-9]+", "-", s.lower()).strip("-")


# ---------------------------------------------------------------------------------------------
def unwrap_ring(coords):
    """Make a ring's longitudes continuous across the antimeridian.

    world-atlas keeps spherical coordinates: a ring that crosses +/-180 deg simply jumps from
    about +180 to -180 (a renderer on the sphere, such as d3-geo, needs nothing else).  Read
    as plane coordinates, that jump is an edge straight across the map.  Returns the ring with
    360 deg added or taken where it jumps, and the net shift (360 when the ring goes round a
    pole, as Antarctica's does)."""
    out = [coords[0]]
    off = 0.0
    for (x0, _), (x1, y1) in zip(coords, coords[1:]):
        if x1 - x0 > 180:
            off -= 360
        elif x1 - x0 < -180:
            off += 360
        out.append((x1 + off, y1))
    return out, off


def planar_polygons(poly):
    """A world-atlas polygon as valid plane polygons within [-180, 180] deg of longitude."""
    rings = []
    jumped = False
    for ring in [poly.exterior] + list(poly.interiors):
        cs, off = unwrap_ring(list(ring.coords))
        jumped = jumped or any(abs(x - x0) > 1e-12 for (x, _), (x0, _) in zip(cs, ring.coords))
        if off != 0:
            # Round a pole: close the ring along the pole's parallel.
            pole = -90.0 if sum(y for _, y in cs) < 0 else 90.0
            cs = cs[:-1] + [(cs[-1][0], pole), (cs[0][0], pole), cs[0]]
        rings.append(cs)
    if not jumped:
        g = poly if poly.is_valid else make_valid(poly)
        return polygonal_parts(g), False
    shell = Polygon(rings[0])
    holes = []
    for h in rings[1:]:
        hp = Polygon(h)
        for k in (-360, 0, 360):  # put each hole on the shell's branch of longitude
            moved = Polygon([(x + k, y) for x, y in h])
            if shell.contains(moved.representative_point()):
                hp = moved
                break
        holes.append(hp)
    g = shell if shell.is_valid else make_valid(shell)
    for hp in holes:
        g = g.difference(hp if hp.is_valid else unary_union(polygonal_parts(make_valid(hp))))
    out = []
    for k in (-720, -360, 0, 360, 720):
        part = g.intersection(box(-180 + k, -90, 180 + k, 90))
        for p in polygonal_parts(part):
            q = Polygon([(x - k, y) for x, y in p.exterior.coords],
                        [[(x - k, y) for x, y in r.coords] for r in p.interiors])
            out.extend(polygonal_parts(q if q.is_valid else make_valid(q)))
    return out, True


def cmd_world_split(a):
    fc = read_geojson(a.input)
    parts = []
    fixed = 0
    cut = 0
    for f in fc["features"]:
        g = shape(f["geometry"])
        for p in polygonal_parts(g):
            valid_before = p.is_valid
            ps, jumped = planar_polygons(p)
            cut += int(jumped)
            if not valid_before and not jumped:
                fixed += 1
                if fixed <= 3:
                    print(f"  invalid input polygon ({explain_validity(p)}), "
                          f"repaired with make_valid")
            parts.extend(ps)
    print(f"  {fixed} invalid input polygon(s) repaired with make_valid (mostly rings that touch "
          f"themselves after the TopoJSON quantisation); {cut} polygon(s) crossing the "
          f"antimeridian cut there")
    if a.simplify_deg > 0:
        simplified = []
        for p in parts:
            s = p.simplify(a.simplify_deg, preserve_topology=True)
            if not s.is_valid:
                s = make_valid(s)
            simplified.extend(q for q in polygonal_parts(s) if q.area > 0)
        parts = simplified
    tree = STRtree(parts)
    out = []
    vertices = 0
    step = a.cell_deg
    for lat0 in range(-90, 90, step):
        for lon0 in range(-180, 180, step):
            cell = box(lon0, lat0, lon0 + step, lat0 + step)
            for p in tree.query(cell):
                if not p.intersects(cell):
                    continue
                c = p.intersection(cell)
                if not c.is_valid:
                    c = make_valid(c)
                for q in polygonal_parts(c):
                    if q.area <= 0:
                        continue
                    if not q.is_valid:
                        fail(f"cell {lon0},{lat0}: invalid piece: {explain_validity(q)}")
                    vertices += len(q.exterior.coords) + sum(len(r.coords) for r in q.interiors)
                    out.append(feature(q, {"cell_lon_deg": lon0, "cell_lat_deg": lat0}))
    write_geojson(a.output, out)
    print(f"world-split: {len(fc['features'])} input feature(s), {fixed} repaired, "
          f"{len(parts)} polygons, {len(out)} pieces on a {step} deg grid, {vertices} vertices")
    # Sanity check of the whole: the land area of the Earth, about 148.9 million km2 with
    # Antarctica (from memory: the usual encyclopaedia figure).  A ring misread across the
    # antimeridian changes it by millions of km2.
    ct = osr.CoordinateTransformation(wgs84_lonlat(), proj("+proj=cea +datum=WGS84 +units=m"))
    total = sum(to_equal_area(shape(f["geometry"]), ct).area for f in out) / 1e6
    ratio = total / EARTH_LAND_AREA_KM2
    print(f"world land area: {total / 1e6:.2f} million km2 (ratio to "
          f"{EARTH_LAND_AREA_KM2 / 1e6} million km2, from memory: {ratio:.4f}; limit 0.97..1.03)")
    if not 0.97 <= ratio <= 1.03:
        fail(f"world land area {total / 1e6:.2f} million km2 is not about 148.9 million km2")


# ---------------------------------------------------------------------------------------------
def parse_gmt_pieces(path):
    """Segments of `gmt coast -M -W` output: list of (level, [(lon, lat), ...])."""
    pieces = []
    level = None
    pts = []
    lvl_re = re.compile(r"Level\s+(\d+)")
    with open(path) as f:
        for line in f:
            line = line.strip()
            if not line or line.startswith("#"):
                continue
            if line.startswith(">"):
                if pts:
                    pieces.append((level, pts))
                m = lvl_re.search(line)
                level = int(m.group(1)) if m else None
                pts = []
            else:
                x, y = line.split()[:2]
                pts.append((float(x), float(y)))
    if pts:
        pieces.append((level, pts))
    return pieces


def snap(v, grid, tol=1e-7):
    for g in grid:
        if abs(v - g) < tol:
            return g
    return v


def gmt_levels(points, res):
    """GSHHG level (0 ocean, 1 land, 2 lake, 3 island in lake, 4 pond) of each point,
    as `gmt select -N` finds it (its own point-in-polygon test on the GSHHG data)."""
    levels = [0] * len(points)
    text = "".join(f"{x:.12f}\t{y:.12f}\t{i}\n" for i, (x, y) in enumerate(points))
    for lvl in (1, 2, 3, 4):
        mask = ["s"] * 5
        mask[lvl] = "k"
        r = subprocess.run(["gmt", "select", f"-D{res}", "-A0/0/4", "-N" + "/".join(mask),
                            "-fg"], input=text, capture_output=True, text=True, check=True)
        for line in r.stdout.splitlines():
            if line.strip() and not line.startswith(">"):
                levels[int(float(line.split()[2]))] = lvl
    return levels


def cmd_demo_assemble(a):
    w, e, s, n = a.region
    region = box(w, s, e, n)
    pieces = parse_gmt_pieces(a.pieces)
    lon_grid = [w, e] + list(range(math.ceil(w), math.floor(e) + 1))
    lat_grid = [s, n] + list(range(math.ceil(s), math.floor(n) + 1))
    closed, open_ = [], []
    for level, pts in pieces:
        if len(pts) < 2:
            continue
        pts = list(pts)
        for k in (0, -1):
            pts[k] = (snap(pts[k][0], lon_grid), snap(pts[k][1], lat_grid))
        if pts[0] == pts[-1] and len(pts) >= 4:
            closed.append((level, LineString(pts)))
        else:
            open_.append((level, LineString(pts)))
    print(f"demo-assemble: {len(pieces)} pieces from gmt coast: {len(closed)} closed rings, "
          f"{len(open_)} open pieces cut at bin edges or the region edge")
    # GMT's full-resolution shorelines are binned on whole degrees, so every cut lies on a
    # whole-degree meridian or parallel, or on the region edge.
    cuts = [LineString(region.exterior.coords)]
    for x in range(math.ceil(w), math.floor(e) + 1):
        if w < x < e:
            cuts.append(LineString([(x, s), (x, n)]))
    for y in range(math.ceil(s), math.floor(n) + 1):
        if s < y < n:
            cuts.append(LineString([(w, y), (e, y)]))
    noded = unary_union([ln for _, ln in open_] + cuts)
    noded = list(noded.geoms) if hasattr(noded, "geoms") else [noded]
    faces, dangles, cut_edges, bad_rings = polygonize_full(noded + [ln for _, ln in closed])
    if len(dangles.geoms) or len(bad_rings.geoms):
        fail(f"polygonize left {len(dangles.geoms)} dangle(s) and {len(bad_rings.geoms)} "
             f"invalid ring(s): the shoreline pieces do not close")
    faces = list(faces.geoms)
    total = sum(f.area for f in faces)
    if abs(total - region.area) > 1e-9 * region.area:
        fail(f"faces cover {total} deg2, region is {region.area} deg2")
    levels = gmt_levels([f.representative_point().coords[0] for f in faces], a.res)
    print(f"  {len(faces)} faces; by GSHHG level: " +
          ", ".join(f"{lv}:{levels.count(lv)}" for lv in sorted(set(levels))))
    by_level = {}
    for f, lv in zip(faces, levels):
        by_level.setdefault(lv, []).append(f)

    named = []
    land_feats = []
    for lv in (1, 3):
        if lv not in by_level:
            continue
        for p in polygonal_parts(unary_union(by_level[lv])):
            if not p.is_valid:
                fail(f"assembled land polygon is invalid: {explain_validity(p)}")
            name = None
            for nm, la, lo in DEMO_ISLANDS:
                if p.contains(Point(lo, la)):
                    name = nm
            fx0, fy0, fx1, fy1 = FORMIGAS_BOX
            if p.within(box(fx0, fy0, fx1, fy1)):
                name = "Formigas"
            named.append((p, name, lv))
    # Largest first, so that feature order is stable and meaningful.
    named.sort(key=lambda t: (-t[0].area, t[0].bounds))
    for p, name, lv in named:
        land_feats.append(feature(p, {"level": lv, "name": name}))
    write_geojson(a.out_prefix + "land.geojson", land_feats)

    lake_feats = []
    for lv in (2, 4):
        for p in polygonal_parts(unary_union(by_level.get(lv, []))):
            lake_feats.append(feature(p, {"level": lv}))
    if lake_feats:
        write_geojson(a.out_prefix + "lakes.geojson", lake_feats)

    coast_feats = []
    for lv in sorted({lv for lv, _ in pieces if lv is not None}):
        lines = [ln for l2, ln in open_ + closed if l2 == lv]
        merged = linemerge(lines)
        merged = list(merged.geoms) if isinstance(merged, MultiLineString) else [merged]
        for ln in merged:
            name = None
            for p, nm, _ in named:
                if p.boundary.distance(ln.interpolate(0.5, normalized=True)) < 1e-9:
                    name = nm
                    break
            coast_feats.append((ln, {"level": lv, "name": name, "closed": int(ln.is_ring)}))
    coast_feats.sort(key=lambda t: (-t[0].length, t[0].bounds))
    write_geojson(a.out_prefix + "coastline.geojson", [feature(g, p) for g, p in coast_feats])
    summary = {"land_polygons": len(land_feats), "lake_polygons": len(lake_feats),
               "coastline_lines": len(coast_feats),
               "named": sorted({nm for _, nm, _ in named if nm}),
               "levels_present": sorted({lv for lv in levels})}
    print("  " + json.dumps(summary, ensure_ascii=False))


# ---------------------------------------------------------------------------------------------
def cmd_check_demo(a):
    w, e, s, n = a.region
    region = box(w, s, e, n)
    ct = equal_area_transform((w + e) / 2, (s + n) / 2)
    lines = []

    def out(msg):
        print(msg)
        lines.append(msg)

    demo = read_ogr_layer(a.demo, "land")
    ne = [(g.intersection(region)) for g, _, _, _ in read_ogr_layer(a.world, "land",
                                                                   (w, s, e, n))]
    ne_land = unary_union([p for g in ne for p in polygonal_parts(g)])
    demo_land = unary_union([g for g, _, _, _ in demo])
    a_demo = to_equal_area(demo_land, ct).area / 1e6
    a_ne = to_equal_area(ne_land, ct).area / 1e6
    a_sym = to_equal_area(demo_land.symmetric_difference(ne_land), ct).area / 1e6
    ratio_area = abs(a_demo - a_ne) / a_demo
    ratio_sym = a_sym / a_demo
    out(f"region W={w} E={e} S={s} N={n} (lon/lat degrees, WGS84)")
    out(f"area_km2 GSHHG full (demo-region.gpkg land): {a_demo:.1f}")
    out(f"area_km2 Natural Earth 10m (world-base.gpkg land, clipped): {a_ne:.1f}")
    out(f"area difference ratio |A_gshhg - A_ne| / A_gshhg: {ratio_area:.4f} "
        f"(limit {a.max_area_ratio})")
    out(f"symmetric difference km2: {a_sym:.1f}; ratio to GSHHG area: {ratio_sym:.4f} "
        f"(limit {a.max_sym_ratio})")
    problems = []
    if ratio_area > a.max_area_ratio:
        problems.append(f"land areas differ by {100 * ratio_area:.1f} % "
                        f"(more than {100 * a.max_area_ratio:.0f} %)")
    if ratio_sym > a.max_sym_ratio:
        problems.append(f"symmetric difference is {100 * ratio_sym:.1f} % of the land area "
                        f"(more than {100 * a.max_sym_ratio:.0f} %)")

    # Every island above the size limit must be on both charts.
    ne_parts = polygonal_parts(ne_land)
    big = 0
    for g, items, fid, _ in demo:
        km2 = to_equal_area(g, ct).area / 1e6
        if km2 >= a.min_island_km2:
            big += 1
            if not any(g.intersects(q) for q in ne_parts):
                problems.append(f"GSHHG island fid {fid} ({items.get('name')}, {km2:.1f} km2) "
                                f"has no Natural Earth land")
    for q in ne_parts:
        km2 = to_equal_area(q, ct).area / 1e6
        if km2 >= a.min_island_km2 and not demo_land.intersects(q):
            c = q.representative_point()
            problems.append(f"Natural Earth island near {c.y:.3f},{c.x:.3f} ({km2:.1f} km2) "
                            f"has no GSHHG land")
    out(f"islands of at least {a.min_island_km2} km2: GSHHG {big}, Natural Earth "
        f"{sum(1 for q in ne_parts if to_equal_area(q, ct).area / 1e6 >= a.min_island_km2)}; "
        f"each found on the other chart: {'yes' if not any('has no' in p for p in problems) else 'NO'}")

    # Each named island: exactly one feature, a Polygon, valid, with closed rings.
    out("island\tfeatures\ttype\tvalid\tclosed\tvertices\tarea_km2")
    for nm, la, lo in DEMO_ISLANDS + [("Formigas", None, None)]:
        hits = [(g, items, fid, og) for g, items, fid, og in demo if items.get("name") == nm]
        if nm != "Formigas":
            inside = [fid for g, _, fid, _ in demo if g.contains(Point(lo, la))]
            if len(inside) != 1 or len(hits) != 1 or inside[0] != hits[0][2]:
                problems.append(f"{nm}: the point {la},{lo} is in {len(inside)} land "
                                f"feature(s), {len(hits)} feature(s) carry the name")
        if not hits:
            problems.append(f"{nm}: missing")
            out(f"{nm}\t0\t-\t-\t-\t-\t-")
            continue
        for g, items, fid, og in hits:
            closed = all(og.GetGeometryRef(i).IsRing() or
                         og.GetGeometryRef(i).GetPoint(0) ==
                         og.GetGeometryRef(i).GetPoint(og.GetGeometryRef(i).GetPointCount() - 1)
                         for i in range(og.GetGeometryCount()))
            valid = og.IsValid()
            gtype = og.GetGeometryName()
            km2 = to_equal_area(g, ct).area / 1e6
            nv = sum(og.GetGeometryRef(i).GetPointCount() for i in range(og.GetGeometryCount()))
            out(f"{nm}\t{len(hits)}\t{gtype}\t{valid}\t{closed}\t{nv}\t{km2:.2f}")
            if gtype != "POLYGON" or not valid or not closed:
                problems.append(f"{nm}: fid {fid} is {gtype}, valid={valid}, closed={closed}")
        if nm != "Formigas" and len(hits) != 1:
            problems.append(f"{nm}: {len(hits)} features, expected one")
    invalid = [fid for g, _, fid, og in demo if not og.IsValid()]
    out(f"land features: {len(demo)}, invalid: {len(invalid)}")
    if invalid:
        problems.append(f"invalid land features: {invalid}")
    if problems:
        for p in problems:
            out("PROBLEM: " + p)
    out("result: " + ("FAIL" if problems else "PASS"))
    with open(a.output, "a", encoding="utf-8") as f:
        f.write("\n".join(lines) + "\n")
    if problems:
        fail("; ".join(problems))


# ---------------------------------------------------------------------------------------------
def farthest_point_order(cands, chosen, count):
    chosen = list(chosen)
    pool = list(cands)
    while len(chosen) < count and pool:
        best = max(pool, key=lambda c: min((c[0] - q[0]) ** 2 + (c[1] - q[1]) ** 2
                                           for q in chosen))
        chosen.append(best)
        pool.remove(best)
    return chosen


def cmd_probes(a):
    w, e, s, n = a.region
    region = box(w, s, e, n)
    demo = read_ogr_layer(a.demo, "land")
    land = unary_union([g for g, _, _, _ in demo])
    coast = land.boundary
    step = a.step_deg
    nx = int(round((e - w) / step))
    ny = int(round((n - s) / step))
    grid = [(round(w + i * step, 6), round(s + j * step, 6))
            for j in range(1, ny) for i in range(1, nx)]
    hull = prep(land.convex_hull)
    open_sea = prep(land.buffer(PROBE_SEA_OPEN_DEG, 32))
    land_ok = prep(land.buffer(-2 * PROBE_MIN_COAST_DEG, 32))
    sea_c = [p for p in grid if hull.contains(Point(p)) and not open_sea.intersects(Point(p))]
    land_c = [p for p in grid if land_ok.contains(Point(p))]
    print(f"probes: {len(sea_c)} open-sea and {len(land_c)} inland candidates on a {step} deg grid")

    rows = []
    # Land: the most inland candidate of each named island, then spread the rest.
    firsts = []
    for nm, _, _ in DEMO_ISLANDS:
        poly = [g for g, items, _, _ in demo if items.get("name") == nm][0]
        pp = prep(poly)
        mine = [p for p in land_c if pp.contains(Point(p))]
        if not mine:
            fail(f"no inland probe candidate on {nm}")
        best = max(mine, key=lambda p: poly.boundary.distance(Point(p)))
        firsts.append((best, nm))
    land_pts = farthest_point_order(land_c, [p for p, _ in firsts], a.count)
    name_of = {}
    for p in land_pts:
        for g, items, _, _ in demo:
            if g.contains(Point(p)):
                name_of[p] = items.get("name") or "islet"
    used = {}
    for p in land_pts:
        nm = slug(name_of[p])
        used[nm] = used.get(nm, 0) + 1
        rows.append((f"demo-land-{nm}-{used[nm]}", p[1], p[0], "land"))
    cx, cy = land.convex_hull.centroid.coords[0]
    start = min(sea_c, key=lambda p: (p[0] - cx) ** 2 + (p[1] - cy) ** 2)
    sea_pts = farthest_point_order(sea_c, [start], a.count)
    for i, p in enumerate(sea_pts, 1):
        rows.append((f"demo-sea-{i:02d}", p[1], p[0], "sea"))

    # Verify each rounded point: inside or outside the demo land (shapely, GEOS), distance to
    # the coastline, and independently with GMT's own test on the GSHHG data.
    report = []
    pts = []
    final = []
    for name, la, lo, exp in rows:
        la, lo = round(la, PROBE_ROUND_DIGITS), round(lo, PROBE_ROUND_DIGITS)
        pt = Point(lo, la)
        inside = land.contains(pt)
        d = coast.distance(pt)
        if (exp == "land") != inside or d < PROBE_MIN_COAST_DEG:
            fail(f"probe {name} {la},{lo}: expected {exp}, inside={inside}, coast {d:.4f} deg")
        final.append((name, la, lo, exp))
        pts.append((lo, la))
        report.append(f"{name}\t{la}\t{lo}\t{exp}\tcoast_distance_deg={d:.4f}")
    levels = gmt_levels(pts, "f")
    for (name, la, lo, exp), lv in zip(final, levels):
        if (exp == "land") != (lv in (1, 3)):
            fail(f"probe {name}: gmt select -Df says level {lv}, expected {exp}")

    world = read_ogr_layer(a.world, "land")
    wtree = STRtree([g for g, _, _, _ in world])
    wpts = []
    for name, la, lo, exp in WORLD_PROBES:
        pt = Point(lo, la)
        inside = any(g.contains(pt) for g in wtree.query(pt))
        # The grid cut lines are not coast: measure to the dissolved land nearby.
        clip = box(lo - 3 * WORLD_PROBE_MARGIN_DEG, la - 3 * WORLD_PROBE_MARGIN_DEG,
                   lo + 3 * WORLD_PROBE_MARGIN_DEG, la + 3 * WORLD_PROBE_MARGIN_DEG)
        near_big = wtree.query(clip)
        boundary = unary_union(near_big).intersection(clip).boundary.difference(
            clip.exterior.buffer(1e-9)) if near_big else LineString()
        d = boundary.distance(pt) if not boundary.is_empty else float("inf")
        if (exp == "land") != inside or d < WORLD_PROBE_MARGIN_DEG:
            fail(f"world probe {name}: expected {exp}, inside={inside}, coast {d:.2f} deg")
        final.append((name, la, lo, exp))
        wpts.append((lo, la))
        far = (f"coast_distance_deg={d:.2f}" if math.isfinite(d) else
               f"no_coast_within_deg={3 * WORLD_PROBE_MARGIN_DEG}")
        report.append(f"{name}\t{la}\t{lo}\t{exp}\t{far}")
    levels = gmt_levels(wpts, "l")
    for (name, la, lo, exp), lv in zip(final[-len(WORLD_PROBES):], levels):
        if (exp == "land") != (lv in (1, 3)):
            fail(f"world probe {name}: gmt select -Dl says level {lv}, expected {exp}")
    with open(a.output, "w", encoding="utf-8") as f:
        f.write("name\tlat\tlon\texpected\n")
        for name, la, lo, exp in final:
            f.write(f"{name}\t{la:.4f}\t{lo:.4f}\t{exp}\n")
    with open(a.checks, "a", encoding="utf-8") as f:
        f.write("probe points (verified: point-in-polygon against demo/world land with GEOS, "
                "distance to coast, and gmt select -Df/-Dl on GSHHG):\n")
        f.write("\n".join(report) + "\n")
    print(f"probes: wrote {len(final)} points to {a.output}")


# ---------------------------------------------------------------------------------------------
def cmd_check_valid(a):
    """Read layers back through GDAL/OGR and check every geometry (GEOS IsValid)."""
    lines = []
    bad = []
    for spec in a.layers:
        path, layer = spec.rsplit(":", 1)
        feats = read_ogr_layer(path, layer)
        invalid = [fid for _, _, fid, og in feats if not og.IsValid()]
        empty = [fid for _, _, fid, og in feats if og.IsEmpty()]
        rel = path[len(a.strip_prefix):] if path.startswith(a.strip_prefix) else path
        lines.append(f"{rel} layer {layer}: {len(feats)} features, {len(invalid)} invalid, "
                     f"{len(empty)} empty (OGR/GEOS IsValid on reading back)")
        if invalid or empty:
            bad.append(f"{rel}:{layer} invalid fids {invalid[:10]}, empty fids {empty[:10]}")
    print("\n".join(lines))
    with open(a.output, "a", encoding="utf-8") as f:
        f.write("\n".join(lines) + "\n")
    if bad:
        fail("; ".join(bad))


def run(cmd):
    return subprocess.run(cmd, capture_output=True, text=True, check=True).stdout


FIRST_XY = re.compile(r"\(+\s*([-0-9.eE+]+)\s+([-0-9.eE+]+)")


def cmd_expected(a):
    rows = ["file\tlayer\tgeometry_type\tfeature_count\tcrs\textent_minx\textent_miny\t"
            "extent_maxx\textent_maxy\tfirst_vertex_x\tfirst_vertex_y\t"
            "first_vertex_lon\tfirst_vertex_lat"]
    for path in a.files:
        info = run(["ogrinfo", "-ro", "-al", "-so", path])
        blocks = info.split("\nLayer name: ")[1:]
        for b in blocks:
            layer = b.split("\n", 1)[0].strip()
            gtype = re.search(r"^Geometry: (.*)$", b, re.M).group(1).strip()
            count = int(re.search(r"^Feature Count: (\d+)$", b, re.M).group(1))
            ext = re.search(r"^Extent: \(([^,]+), ([^)]+)\) - \(([^,]+), ([^)]+)\)$", b, re.M)
            ext = [x.strip() for x in ext.groups()] if ext else ["", "", "", ""]
            # The layer CRS's own identifier is the last top-level ID[...] of its WKT.
            m = re.findall(r'^    ID\["EPSG",(\d+)\]\]', b, re.M)
            crs = f"EPSG:{m[-1]}" if m else ""
            vx = vy = vlon = vlat = ""
            if count > 0 and gtype != "None":
                native = run(["ogr2ogr", "-f", "CSV", "/vsistdout/", path, layer, "-limit", "1",
                              "-lco", "GEOMETRY=AS_WKT"])
                geo = run(["ogr2ogr", "-f", "CSV", "/vsistdout/", path, layer, "-limit", "1",
                           "-lco", "GEOMETRY=AS_WKT", "-t_srs", "EPSG:4326"])
                vx, vy = FIRST_XY.search(native.splitlines()[1]).groups()
                vlon, vlat = FIRST_XY.search(geo.splitlines()[1]).groups()
            rel = path[len(a.strip_prefix):] if path.startswith(a.strip_prefix) else path
            rows.append("\t".join([rel, layer, gtype, str(count), crs] + ext +
                                  [vx, vy, vlon, vlat]))
    with open(a.output, "w", encoding="utf-8") as f:
        f.write("\n".join(rows) + "\n")
    print(f"expected: {len(rows) - 1} layer(s) recorded in {a.output}")


def region_arg(s):
    v = [float(x) for x in s.split("/")]
    if len(v) != 4:
        raise argparse.ArgumentTypeError("region is W/E/S/N")
    return v


def main():
    p = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    sub = p.add_subparsers(dest="cmd", required=True)
    q = sub.add_parser("world-split")
    q.add_argument("input")
    q.add_argument("output")
    q.add_argument("--cell-deg", type=int, default=10)
    q.add_argument("--simplify-deg", type=float, default=0.0)
    q.set_defaults(fn=cmd_world_split)
    q = sub.add_parser("demo-assemble")
    q.add_argument("pieces")
    q.add_argument("--region", type=region_arg, required=True)
    q.add_argument("--res", default="f")
    q.add_argument("--out-prefix", required=True)
    q.set_defaults(fn=cmd_demo_assemble)
    q = sub.add_parser("check-demo")
    q.add_argument("--demo", required=True)
    q.add_argument("--world", required=True)
    q.add_argument("--region", type=region_arg, required=True)
    q.add_argument("--output", required=True)
    q.add_argument("--max-area-ratio", type=float, default=0.10)
    q.add_argument("--max-sym-ratio", type=float, default=0.25)
    q.add_argument("--min-island-km2", type=float, default=1.0)
    q.set_defaults(fn=cmd_check_demo)
    q = sub.add_parser("probes")
    q.add_argument("--demo", required=True)
    q.add_argument("--world", required=True)
    q.add_argument("--region", type=region_arg, required=True)
    q.add_argument("--output", required=True)
    q.add_argument("--checks", required=True)
    q.add_argument("--count", type=int, default=10)
    q.add_argument("--step-deg", type=float, default=0.01)
    q.set_defaults(fn=cmd_probes)
    q = sub.add_parser("check-valid")
    q.add_argument("--output", required=True)
    q.add_argument("--strip-prefix", default="")
    q.add_argument("layers", nargs="+", help="FILE:LAYER")
    q.set_defaults(fn=cmd_check_valid)
    q = sub.add_parser("expected")
    q.add_argument("--output", required=True)
    q.add_argument("--strip-prefix", default="")
    q.add_argument("files", nargs="+")
    q.set_defaults(fn=cmd_expected)
    a = p.parse_args()
    a.fn(a)


if __name__ == "__main__":
    main()
