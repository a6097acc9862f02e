package main

import (
	"math"
	"path/filepath"
	"slices"
	"strconv"
	"strings"
	"testing"

	"cleft/plots/words"

	"golang.org/x/net/html"
)

// lookFirst returns the items of the report's look-first list.
func lookFirst(t *testing.T, dir string) []string {
	t.Helper()
	var items []string
	walk(byID(parseHTML(t, filepath.Join(dir, "report.html")), "summary"), func(n *html.Node) {
		if n.Type == html.ElementNode && n.Data == "ol" {
			if c, _ := attr(n, "class"); c == "look" {
				for li := n.FirstChild; li != nil; li = li.NextSibling {
					if li.Type == html.ElementNode && li.Data == "li" {
						items = append(items, text(li))
					}
				}
			}
		}
	})
	if len(items) == 0 {
		t.Fatal("the report's summary has no look-first list")
	}
	return items
}

// anyContains reports whether some item contains every one of parts.
func anyContains(items []string, parts ...string) bool {
	for _, it := range items {
		all := true
		for _, p := range parts {
			all = all && strings.Contains(it, p)
		}
		if all {
			return true
		}
	}
	return false
}

// csvColumns returns the header index of a table.
func csvColumns(rows [][]string) map[string]int {
	m := map[string]int{}
	for i, c := range rows[0] {
		m[c] = i
	}
	return m
}

// waterWord is the report's word for a water case column suffix of
// slope.csv ("0m", "5m", "table_18m", "full").
func waterWord(suffix string) string {
	switch {
	case suffix == "full":
		return "saturated"
	case suffix == "0m":
		return "dry"
	case strings.HasPrefix(suffix, "table_"):
		return "table " + strings.TrimSuffix(strings.TrimPrefix(suffix, "table_"), "m") + " m below the crest"
	}
	return strings.TrimSuffix(suffix, "m") + " m of water"
}

// leastSlopeFS reads slope.csv for its least factor of safety over every
// feasible case and water case.
func leastSlopeFS(t *testing.T, dir string) (planes, water string, fs float64) {
	rows := readCSV(t, filepath.Join(dir, "slope.csv"))
	col := csvColumns(rows)
	fs = math.Inf(1)
	for _, r := range rows[1:] {
		if r[col["feasible"]] != "yes" {
			continue
		}
		for name, i := range col {
			if w, ok := strings.CutPrefix(name, "fs_water_"); ok && r[i] != "" {
				if v, err := strconv.ParseFloat(r[i], 64); err == nil && v < fs {
					planes, water, fs = r[col["planes"]], w, v
				}
			}
		}
	}
	return planes, water, fs
}

// stretchesOf returns the runs of consecutive rows of a per-station table
// (one row per station and set, in station order) where cond holds for
// set, as "from–to" (or "from" for one station).
func stretchesOf(rows [][]string, set string, cond func(r []string) bool) []string {
	col := csvColumns(rows)
	var out []string
	var from, to string
	on := false
	flush := func() {
		if on {
			if from == to {
				out = append(out, from)
			} else {
				out = append(out, from+"–"+to)
			}
		}
		on = false
	}
	for _, r := range rows[1:] {
		if r[col["set"]] != set {
			continue
		}
		if cond(r) {
			if !on {
				from, on = r[col["chainage"]], true
			}
			to = r[col["chainage"]]
		} else {
			flush()
		}
	}
	flush()
	return out
}

func TestSummaryLeadsWithTheSlopeAndTheTunnel(t *testing.T) {
	// Issue 15: the Summary must mention the least stable slope case and
	// tunnel stretch when the site has them. Read back from the report's
	// own tables (slope.csv, profile.csv, stations.csv, zones.csv).
	dir := demoReport(t)
	items := lookFirst(t, dir)
	planes, water, fs := leastSlopeFS(t, dir)
	if planes == "" || !anyContains(items, planes+":", "FS "+words.Fixed(fs, 2)+" "+waterWord(water)) {
		t.Errorf("no item names the least safe slope case %s, FS %.2f %s:\n%s", planes, fs, waterWord(water), strings.Join(items, "\n"))
	}
	// The tunnel wall at the station of the largest σmax/UCS.
	prof := readCSV(t, filepath.Join(dir, "profile.csv"))
	col := csvColumns(prof)
	worst, ratio := "", -1.0
	for _, r := range prof[1:] {
		if v, _ := strconv.ParseFloat(r[col["sigma_max_to_ucs"]], 64); v > ratio {
			worst, ratio = r[col["chainage"]], v
		}
	}
	if !anyContains(items, "Tunnel wall", "σmax/UCS "+words.Fixed(ratio, 2), "chainage "+worst+" m") {
		t.Errorf("no item names the tunnel wall's worst station %s m (σmax/UCS %.2f)", worst, ratio)
	}
	// A plane critical in the far field along a stretch, and a set whose
	// slip zone reaches deeper than the limit (radius 4.2 m × 0.5) along
	// another.
	st := readCSV(t, filepath.Join(dir, "stations.csv"))
	sc := csvColumns(st)
	far := stretchesOf(st, "F1", func(r []string) bool {
		v, err := strconv.ParseFloat(r[sc["factor_of_safety"]], 64)
		return err != nil || v <= 1
	})
	if len(far) == 0 || !anyContains(items, "F1 along the tunnel", "far field at "+strings.Join(far, ", ")+" m") {
		t.Errorf("no item names F1's far-field stretch %v", far)
	}
	zones := readCSV(t, filepath.Join(dir, "zones.csv"))
	zc := csvColumns(zones)
	const limit = 2.1 // m: the demo's radius 4.2 m × 0.5 (README, zone_depth_limit)
	deep := stretchesOf(zones, "S2", func(r []string) bool {
		v, _ := strconv.ParseFloat(r[zc["slip_zone_depth_m"]], 64)
		return v > limit || r[zc["slip_zone_extent"]] != "bounded"
	})
	if len(deep) == 0 || !anyContains(items, "S2 along the tunnel", "deeper than the limit of 2.1 m at "+strings.Join(deep, ", ")+" m") {
		t.Errorf("no item names S2's zone deeper than the limit at %v", deep)
	}
	// The list is ranked: the opening fault first.
	if !strings.HasPrefix(items[0], "F2 (80/038 at 150 m): opening") {
		t.Errorf("first item %q, want the opening F2", items[0])
	}
}

func TestSummaryJSONHasTheDecision(t *testing.T) {
	dir := demoReport(t)
	var raw map[string]any
	readJSON(t, filepath.Join(dir, "summary.json"), &raw)
	for _, k := range []string{"slope", "tunnel", "chance", "look_first", "frictional_limit", "least_stable"} {
		if _, ok := raw[k]; !ok {
			t.Errorf("summary.json has no %q", k)
		}
	}
	var d summaryDoc
	readJSON(t, filepath.Join(dir, "summary.json"), &d)
	// slope: feasible counts per test, least_fs with case, planes, water case.
	if d.Slope == nil || d.Slope.Feasible["planar"] != 1 || d.Slope.Feasible["wedge"] != 3 || d.Slope.Feasible["flexural-toppling"] != 1 {
		t.Fatalf("slope = %+v, want feasible 1 planar, 3 wedge, 1 flexural-toppling", d.Slope)
	}
	planes, water, fs := leastSlopeFS(t, dir)
	const tol = 1e-6 // slope.csv carries 8 significant digits
	if l := d.Slope.LeastFS; l == nil || strings.Join(l.Planes, "+") != planes || l.WaterCase != water || math.Abs(float64(l.FactorOfSafety)-fs) > tol || l.Case != "planar" {
		t.Errorf("least_fs = %+v, want %s %s %g from slope.csv", d.Slope.LeastFS, planes, water, fs)
	}
	// tunnel: worst station, spalling, deepest slip zones.
	tn := d.Tunnel
	if tn == nil || tn.Stations != 57 || float64(tn.WorstStation.Chainage) != 575 || tn.Spalling.Band != "at-onset" || len(tn.Spalling.Stretches) == 0 {
		t.Fatalf("tunnel = %+v", tn)
	}
	zones := readCSV(t, filepath.Join(dir, "zones.csv"))
	zc := csvColumns(zones)
	best := -1.0
	for _, r := range zones[1:] {
		if r[zc["slip_zone_extent"]] == "bounded" {
			if v, _ := strconv.ParseFloat(r[zc["slip_zone_depth_m"]], 64); v > best {
				best = v
			}
		}
	}
	if tn.Bounded == nil || math.Abs(float64(tn.Bounded.Depth)-best) > tol || tn.Deepest == nil || tn.Deepest.Extent != "unbounded" || tn.Deepest.Set != "F1" {
		t.Errorf("deepest zones %+v and %+v, want the unbounded F1 and a bounded %g m from zones.csv", tn.Deepest, tn.Bounded, best)
	}
	if len(tn.FarField) != 1 || tn.FarField[0].Set != "F1" {
		t.Errorf("far_field_unstable = %+v, want F1", tn.FarField)
	}
	// chance: the cases and the Monte Carlo.
	if c := d.Chance; c == nil || len(c.Cases) != 4 || c.Realisations != 4000 || c.Robust == nil || len(c.LeastSure) != 3 || c.LeastSure[0].Name != "F2" {
		t.Errorf("chance = %+v", d.Chance)
	}
	// look_first: kind, name, measure, value, reason; the same list as the
	// report's.
	items := lookFirst(t, dir)
	if len(d.LookFirst) != len(items) {
		t.Fatalf("%d look_first entries, %d in the report", len(d.LookFirst), len(items))
	}
	for i, l := range d.LookFirst {
		if l.Kind == "" || l.Name == "" && l.Kind != "tunnel-wall" || l.Measure == "" || l.Reason == nil || l.Standing == "" {
			t.Errorf("look_first[%d] = %+v", i, l)
		}
		if l.Text != items[i] {
			t.Errorf("look_first[%d] text %q, report %q", i, l.Text, items[i])
		}
	}
	if f := d.LookFirst[0]; f.Kind != "plane" || f.Name != "F2" || f.Measure != "effective_normal_stress_mpa" || !slices.Contains(f.Decisive, "own-pore-pressure") {
		t.Errorf("look_first[0] = %+v, want F2 opening by its own pore pressure", f)
	}
}

func TestKeyTableShowsThePlanesOwnInputs(t *testing.T) {
	// Issue 15: F1 is critical by its own μ 0.45, F2 opens by its own
	// 2.9 MPa of pore pressure, J-cut-3 has c 0.04 MPa (planes.csv of the
	// demo); the key table shows each, marked as the plane's own, and the
	// site's values unmarked for the others.
	dir := demoReport(t)
	type cell struct {
		text string
		own  bool
	}
	rows := map[string][]cell{}
	var head []string
	walk(byID(parseHTML(t, filepath.Join(dir, "report.html")), "planes"), func(n *html.Node) {
		if n.Type != html.ElementNode || n.Data != "tr" {
			return
		}
		if n.Parent.Data == "thead" {
			for th := n.FirstChild; th != nil; th = th.NextSibling {
				if th.Type == html.ElementNode {
					head = append(head, text(th))
				}
			}
			return
		}
		var cs []cell
		for td := n.FirstChild; td != nil; td = td.NextSibling {
			if td.Type == html.ElementNode && td.Data == "td" {
				c, _ := attr(td, "class")
				cs = append(cs, cell{text(td), strings.Contains(c, "own")})
			}
		}
		if len(cs) > 0 && cs[0].text != "" {
			rows[cs[0].text] = cs
		}
	})
	mu, c, pp := slices.Index(head, "μ"), slices.Index(head, "c MPa"), slices.Index(head, "Pp MPa")
	if mu < 0 || c < 0 || pp < 0 {
		t.Fatalf("key table columns %v lack μ, c or Pp", head)
	}
	for _, w := range []struct {
		plane string
		col   int
		text  string
		own   bool
	}{
		{"F1", mu, "0.45*", true}, {"J-cut-3", c, "0.04*", true}, {"F2", pp, "2.90*", true},
		{"B1", mu, "0.6", false}, {"B1", c, "0", false}, {"F1", pp, "1.59", false}, {"S2 mean", mu, "0.6", false},
	} {
		r, ok := rows[w.plane]
		if !ok {
			t.Errorf("no row %s in the key table", w.plane)
			continue
		}
		if got := r[w.col]; got.text != w.text || got.own != w.own {
			t.Errorf("%s %s = %+v, want %q own %v", w.plane, head[w.col], got, w.text, w.own)
		}
	}
	// F1's Pp is the water model's at its 180 m: 0.00981 MPa/m × (180 − 18 m)
	// = 1.589 MPa (derived from the demo's water: block), as planes.csv has it.
	if _, ok := rows["BH2-098"]; ok {
		t.Error("the key table lists a reading")
	}
	extra := 0
	walk(byID(parseHTML(t, filepath.Join(dir, "report.html")), "planes"), func(n *html.Node) {
		if c, _ := attr(n, "class"); n.Type == html.ElementNode && c == "extra" && strings.Contains(text(n), "note: clay gouge") {
			extra++
		}
	})
	if extra != 1 {
		t.Errorf("%d rows carry F1's note, want 1", extra)
	}
}

const quarrySite = `site: quarry
depth: 15
stress:
  vertical: {gradient: 0.026}
  shmax: {ratio: 0.9, azimuth: 0}
  shmin: {ratio: 0.8}
water: {dry: true}
strength: {friction: 0.7}
planes:
  - {name: Q1, dip: 40, dip_direction: 180}
  - {name: Q2, dip: 75, dip_direction: 90}
slope:
  face: {dip: 70, dip_direction: 180}
  height: 20
  friction_angle: 30
`

func TestQuarrySummaryLeadsWithPlanarSliding(t *testing.T) {
	// The quarry: every plane stable under the stress, but planar
	// sliding on Q1 below FS 1 even dry. Dry and cohesionless, without
	// loads, FS = tan φ / tan ψp = tan 30° / tan 40° = 0.68806 (derived
	// from Hoek & Bray's 1981 planar form with U = V = c = T = α = 0); the
	// saturated case (in every slope's water cases) is lower still.
	dir := files(t, map[string]string{"q.yaml": quarrySite})
	out := filepath.Join(dir, "o")
	code, stdout, stderr := cleft(t, "", "assess", filepath.Join(dir, "q.yaml"), "--out", out)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	var d summaryDoc
	readJSON(t, filepath.Join(out, "summary.json"), &d)
	if d.Critical != 0 || d.Opening != 0 {
		t.Fatalf("quarry planes: %d critical, %d opening; want all stable", d.Critical, d.Opening)
	}
	rows := readCSV(t, filepath.Join(out, "slope.csv"))
	col := csvColumns(rows)
	dry, _ := strconv.ParseFloat(rows[1][col["fs_water_0m"]], 64)
	full, _ := strconv.ParseFloat(rows[1][col["fs_water_full"]], 64)
	const tol = 1e-6 // slope.csv carries 8 significant digits
	if want := math.Tan(30*math.Pi/180) / math.Tan(40*math.Pi/180); rows[1][col["planes"]] != "Q1" || math.Abs(dry-want) > tol {
		t.Fatalf("slope.csv Q1 dry FS %v, want %.5f", dry, want)
	}
	if len(d.LookFirst) == 0 || d.LookFirst[0].Kind != "planar" || d.LookFirst[0].Name != "Q1" || d.LookFirst[0].Standing != "fails" ||
		d.LookFirst[0].WaterCase != "full" || math.Abs(float64(d.LookFirst[0].Value)-full) > tol {
		t.Errorf("look_first = %+v, want planar Q1 first at its saturated FS %g", d.LookFirst, full)
	}
	if d.Tunnel != nil || d.Chance != nil {
		t.Errorf("a site without tunnel: or cases: has tunnel %+v, chance %+v", d.Tunnel, d.Chance)
	}
	items := lookFirst(t, out)
	lead := "Planar sliding on Q1: FS " + words.Fixed(full, 2) + " saturated (0.69 dry); at or below 1 even dry"
	if !strings.HasPrefix(items[0], lead) || !strings.Contains(stdout, " 1. "+lead) {
		t.Errorf("the summary does not lead with %q: %q\n%s", lead, items[0], stdout)
	}
}
