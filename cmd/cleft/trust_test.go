package main

import (
	"fmt"
	"math/rand/v2"
	"os"
	"path/filepath"
	"slices"
	"strconv"
	"strings"
	"testing"

	"cleft/planes"
	"cleft/planes/assess"
	"cleft/planes/site"

	"golang.org/x/net/html"
)

// openingRise checks one output row: an opening plane must not have a
// positive pressure to slip (issue 11). It returns whether the row is
// opening.
func openingRise(t *testing.T, where, state, rise string) bool {
	t.Helper()
	if !strings.Contains(strings.ToLower(state), "opening") {
		return false
	}
	if rise == "" || rise == "—" {
		return true
	}
	v, err := strconv.ParseFloat(strings.Replace(rise, "−", "-", 1), 64)
	if err != nil || v > 0 {
		t.Errorf("%s: opening with pressure to slip %q", where, rise)
	}
	return true
}

// checkNoOpeningWithRise reads every output of an assessment that shows a
// plane's state beside its pressure to slip — planes.csv, planes.json,
// sets.csv, summary.json and the report's plane and set tables — and
// returns how many opening rows it saw.
func checkNoOpeningWithRise(t *testing.T, dir string) int {
	t.Helper()
	n := 0
	for _, name := range []string{"planes.csv", "sets.csv"} {
		rows := readCSV(t, filepath.Join(dir, name))
		st, dp := slices.Index(rows[0], "state"), slices.Index(rows[0], "pressure_to_slip_mpa")
		if st < 0 || dp < 0 {
			t.Fatalf("%s: no state or pressure_to_slip_mpa column in %v", name, rows[0])
		}
		for i, r := range rows[1:] {
			if openingRise(t, fmt.Sprintf("%s row %d (%s)", name, i+1, r[0]), r[st], r[dp]) {
				n++
			}
		}
	}
	var js []map[string]any
	readJSON(t, filepath.Join(dir, "planes.json"), &js)
	for i, r := range js {
		rise := ""
		if v, ok := r["pressure_to_slip_mpa"].(float64); ok {
			rise = strconv.FormatFloat(v, 'g', -1, 64)
		}
		openingRise(t, fmt.Sprintf("planes.json row %d", i+1), fmt.Sprint(r["state"]), rise)
	}
	var sum struct {
		LeastStable []map[string]any `json:"least_stable"`
	}
	readJSON(t, filepath.Join(dir, "summary.json"), &sum)
	for _, r := range sum.LeastStable {
		rise := ""
		if v, ok := r["pressure_to_slip_mpa"].(float64); ok {
			rise = strconv.FormatFloat(v, 'g', -1, 64)
		}
		openingRise(t, fmt.Sprintf("summary.json %v", r["name"]), fmt.Sprint(r["state"]), rise)
	}
	// The report: each table of the Planes section (the key table) and
	// each table of the appendix with a state column (the readings), its
	// ΔPp column by its header, its rows by their class.
	doc := parseHTML(t, filepath.Join(dir, "report.html"))
	tables := 0
	check := func(section string, tb *html.Node) {
		if tb.Type != html.ElementNode || tb.Data != "table" {
			return
		}
		col, k, state := -1, 0, false
		walk(tb, func(th *html.Node) {
			if th.Type == html.ElementNode && th.Data == "th" && th.Parent.Parent.Data == "thead" {
				switch text(th) {
				case "ΔPp to slip":
					col = k
				case "state":
					state = true
				}
				k++
			}
		})
		if section == "appendix" && !state {
			return
		}
		if col < 0 {
			t.Errorf("a report table of the %s section has no ΔPp column", section)
			return
		}
		tables++
		walk(tb, func(tr *html.Node) {
			c, _ := attr(tr, "class")
			if tr.Type != html.ElementNode || tr.Data != "tr" || c != "opening" {
				return
			}
			var cells []string
			for td := tr.FirstChild; td != nil; td = td.NextSibling {
				if td.Type == html.ElementNode && td.Data == "td" {
					cells = append(cells, text(td))
				}
			}
			openingRise(t, "report row "+cells[0], c, cells[col])
		})
	}
	for _, section := range []string{"planes", "appendix"} {
		if n := byID(doc, section); n != nil {
			walk(n, func(tb *html.Node) { check(section, tb) })
		}
	}
	if tables == 0 {
		t.Error("the report has no plane table")
	}
	return n
}

func TestDemoHasNoOpeningPlaneWithAPressureToSlip(t *testing.T) {
	// Issue 11: no plane anywhere is opening with a positive pressure to
	// slip. The demo's F2 is opening (σn' < 0).
	if n := checkNoOpeningWithRise(t, demoReport(t)); n == 0 {
		t.Error("no opening plane in the demo outputs: the check saw nothing")
	}
}

// cohesiveSite writes a site of cohesive planes, many of them opening: the
// issue's case 20/090 at 200 m (c = 1 MPa, μ 0.6, dry, Sv = 5, 6 MPa
// north–south, 4 east–west), the same with 4.9 MPa of its own pore
// pressure, and seeded random planes with their own cohesion, friction and
// pore pressure; the demo readings; a tunnel.
func cohesiveSite(t *testing.T) string {
	dir := t.TempDir()
	rng := rand.New(rand.NewPCG(151, 152))
	var b strings.Builder
	b.WriteString("name,dip,dip_direction,depth,friction,cohesion,pore_pressure\n")
	for i := range 300 {
		z := 10 + rng.Float64()*390
		coh := ""
		if rng.IntN(4) > 0 {
			coh = fmt.Sprintf("%.3f", rng.Float64()*2)
		}
		fmt.Fprintf(&b, "R%d,%.2f,%.2f,%.1f,%.3f,%s,%.3f\n", i, rng.Float64()*90, rng.Float64()*360, z, 0.3+rng.Float64()*0.6, coh, rng.Float64()*0.03*z)
	}
	write := func(name, body string) {
		if err := os.WriteFile(filepath.Join(dir, name), []byte(body), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	write("planes.csv", b.String())
	readings, _ := os.ReadFile(demoReadings)
	write("readings.csv", string(readings))
	write("site.yaml", `site: cohesive planes (test)
depth: 200
stress:
  vertical: {gradient: 0.025}
  shmax: {ratio: 1.2, azimuth: 0}
  shmin: {ratio: 0.8}
water: {dry: true}
strength: {friction: 0.6, cohesion: 1}
planes:
  - {name: P20, dip: 20, dip_direction: 90}
  - {name: P20wet, dip: 20, dip_direction: 90, pore_pressure: 4.9}
planes_file: planes.csv
readings_file: readings.csv
tunnel:
  alignment: [{from: 0, to: 300, trend: 40}]
  cover: [[0, 150], [300, 250]]
  spacing: 50
  radius: 4
  rock: {ucs: 60}
  sets: [P20, P20wet, R1, R2, R3, S1]
`)
	return filepath.Join(dir, "site.yaml")
}

func TestCohesivePlanesOpenBeforeTheySlip(t *testing.T) {
	p := cohesiveSite(t)
	out := filepath.Join(filepath.Dir(p), "out")
	if code, _, stderr := cleft(t, "", "assess", p, "--out", out); code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	if n := checkNoOpeningWithRise(t, out); n < 20 {
		t.Errorf("%d opening rows: too few for the check to mean much", n)
	}
	// The case (derivation in planes.TestTensionCutOffIssueCase):
	// ΔPp = σn' = 4.883 by opening, not 6.01; with 4.9 MPa more it is
	// opening with −0.017, not +1.11.
	rows := readCSV(t, filepath.Join(out, "planes.csv"))
	dp, st := slices.Index(rows[0], "pressure_to_slip_mpa"), slices.Index(rows[0], "state")
	for _, want := range [][3]string{{"P20", "4.8830222", "stable"}, {"P20wet", "-0.016977778", "opening"}} {
		i := slices.IndexFunc(rows, func(r []string) bool { return r[0] == want[0] })
		if i < 0 || rows[i][dp] != want[1] || rows[i][st] != want[2] {
			t.Errorf("%s: %v; want ΔPp %s, %s", want[0], rows[i], want[1], want[2])
		}
	}
	// The tunnel's far-field rows (stations.csv carries no state): through
	// the same assessment from Go.
	s, err := site.Load(p)
	if err != nil {
		t.Fatal(err)
	}
	a, err := assess.New(s)
	if err != nil {
		t.Fatal(err)
	}
	tn, err := a.Tunnel()
	if err != nil {
		t.Fatal(err)
	}
	opening := 0
	for _, stn := range tn.Stations {
		for i, r := range stn.Rows {
			if r.Far.State == planes.Opening {
				opening++
				if r.Far.PressureToSlip > 0 {
					t.Errorf("tunnel %g m, %s: opening with ΔPp %v", stn.Chainage, tn.Targets[i].Name, r.Far.PressureToSlip)
				}
			}
		}
	}
	if opening == 0 {
		t.Error("no target opens along the tunnel: the check saw nothing")
	}
}

func TestWoodcockColumnsRawAndWeighted(t *testing.T) {
	// Issue 11, item 8: with a sampling line the raw woodcock_k/woodcock_c
	// stay those of the unweighted readings (the same sets without --line
	// give the same values), the weighted ones are beside them.
	dir := t.TempDir()
	if code, _, stderr := cleft(t, "", "sets", demoReadings, "--out", filepath.Join(dir, "raw")); code != 0 {
		t.Fatal(stderr)
	}
	if code, _, stderr := cleft(t, "", "sets", demoReadings, "--line", "100/70", "--out", filepath.Join(dir, "line")); code != 0 {
		t.Fatal(stderr)
	}
	raw, line := readCSV(t, filepath.Join(dir, "raw", "sets.csv")), readCSV(t, filepath.Join(dir, "line", "sets.csv"))
	col := func(name string) int { return slices.Index(raw[0], name) }
	k, c, wk, wc, n, dd := col("woodcock_k"), col("woodcock_c"), col("weighted_woodcock_k"), col("weighted_woodcock_c"), col("count"), col("mean_dip_direction")
	if wk < 0 || wc < 0 {
		t.Fatalf("sets.csv header %v lacks the weighted Woodcock columns", raw[0])
	}
	differ := 0
	for _, r := range raw[1 : len(raw)-1] {
		if r[k] != r[wk] || r[c] != r[wc] {
			t.Errorf("unweighted set %s: raw %s %s, weighted %s %s", r[0], r[k], r[c], r[wk], r[wc])
		}
		// The same set with the line: same count and mean plane (the sets
		// come in another order, by weighted count).
		i := slices.IndexFunc(line, func(l []string) bool { return l[n] == r[n] && l[dd] == r[dd] })
		if i < 0 {
			t.Fatalf("set %s (%s readings) not found with --line", r[0], r[n])
		}
		if line[i][k] != r[k] || line[i][c] != r[c] {
			t.Errorf("set of %s readings: raw K, C %s, %s with --line; %s, %s without", r[n], line[i][k], line[i][c], r[k], r[c])
		}
		if line[i][wk] != line[i][k] {
			differ++
		}
	}
	if differ == 0 {
		t.Error("the line changed no weighted Woodcock K")
	}
}
