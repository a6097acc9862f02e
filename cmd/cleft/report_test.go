package main

import (
	"bytes"
	"image"
	"image/png"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"golang.org/x/net/html"
	"rsc.io/pdf"
)

// demoReport runs assess --example with a fixed clock and returns the
// output folder.
func demoReport(t *testing.T) string {
	t.Helper()
	old := now
	now = func() time.Time { return time.Date(2026, 12, 1, 9, 30, 0, 0, time.UTC) }
	defer func() { now = old }()
	dir := t.TempDir()
	if code, _, stderr := cleft(t, "", "assess", "--example", "--out", dir); code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	return dir
}

func parseHTML(t *testing.T, path string) *html.Node {
	t.Helper()
	f, err := os.Open(path)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	doc, err := html.Parse(f)
	if err != nil {
		t.Fatalf("%s: %v", path, err)
	}
	return doc
}

func walk(n *html.Node, fn func(*html.Node)) {
	fn(n)
	for c := n.FirstChild; c != nil; c = c.NextSibling {
		walk(c, fn)
	}
}

func attr(n *html.Node, key string) (string, bool) {
	for _, a := range n.Attr {
		if a.Key == key {
			return a.Val, true
		}
	}
	return "", false
}

func byID(doc *html.Node, id string) *html.Node {
	var found *html.Node
	walk(doc, func(n *html.Node) {
		if v, ok := attr(n, "id"); ok && v == id && found == nil {
			found = n
		}
	})
	return found
}

func text(n *html.Node) string {
	var b strings.Builder
	walk(n, func(c *html.Node) {
		if c.Type == html.TextNode {
			b.WriteString(c.Data)
		}
	})
	return b.String()
}

func TestReportStructure(t *testing.T) {
	dir := demoReport(t)
	doc := parseHTML(t, filepath.Join(dir, "report.html"))
	for _, id := range []string{"header", "summary", "look-first", "inputs", "stress", "planes", "sets", "slope", "tunnel", "figures", "method", "limitations", "appendix", "readings"} {
		if byID(doc, id) == nil {
			t.Errorf("no section #%s", id)
		}
	}
	// The key table: one row per mapped plane and set mean, not the
	// readings (group rows and the rows of carried columns aside); the
	// appendix one row per set of readings and the unassigned ones.
	count := func(id string) int {
		rows := 0
		walk(byID(doc, id), func(n *html.Node) {
			if n.Type == html.ElementNode && n.Data == "tr" {
				if c, _ := attr(n, "class"); c == "stable" || c == "critical" || c == "opening" {
					rows++
				}
			}
		})
		return rows
	}
	if rows := count("planes"); rows != 6+3 {
		t.Errorf("%d plane and set rows in the key table, want 6 planes + 3 sets", rows)
	}
	if rows := count("appendix"); rows != 3+1 {
		t.Errorf("%d rows of readings in the appendix, want 3 sets + the unassigned", rows)
	}
	figs, svgs := 0, 0
	walk(doc, func(n *html.Node) {
		if n.Type != html.ElementNode {
			return
		}
		switch n.Data {
		case "figure":
			figs++
		case "svg":
			svgs++
		case "script", "link", "iframe", "object", "embed":
			t.Errorf("the report has a <%s>", n.Data)
		}
		for _, a := range n.Attr {
			if a.Key == "src" || a.Key == "href" || strings.HasSuffix(a.Key, "href") {
				if !strings.HasPrefix(a.Val, "data:") && !strings.HasPrefix(a.Val, "#") {
					t.Errorf("<%s %s=%q> points outside the file", n.Data, a.Key, a.Val)
				}
			}
		}
	})
	if figs != len(keyFigures) || svgs != len(keyFigures) { // the others are files, named in the report
		t.Errorf("%d figures, %d inline SVGs; want %d and %d", figs, svgs, len(keyFigures), len(keyFigures))
	}
	if f := text(byID(doc, "figures")); !strings.Contains(f, "stereonet-dilation") || !strings.Contains(f, "chance-sensitivity") {
		t.Error("the figures section does not name the figures it leaves to files")
	}
	// The tunnel section leads with the slip zones: one row per screened
	// set, and the zone caution.
	zrows := 0
	walk(byID(doc, "zones"), func(n *html.Node) {
		if n.Type == html.ElementNode && n.Data == "tr" {
			zrows++
		}
	})
	if zrows != 1+4 {
		t.Errorf("zone table has %d rows, want a header and the 4 sets", zrows-1)
	}
	if tn := text(byID(doc, "tunnel")); !strings.Contains(tn, "deepest slip zone of each plane or set") || !strings.Contains(tn, "not a support design") || !strings.Contains(tn, "Thiem") {
		t.Error("the tunnel section lacks the zone table's headline, caution or pore-pressure rule")
	}
	data, _ := os.ReadFile(filepath.Join(dir, "report.html"))
	for _, bad := range []string{"http://", "https://", "@import", "url("} {
		if i := bytes.Index(data, []byte(bad)); i >= 0 && !bytes.Contains(data[max(0, i-40):i], []byte("xmlns")) {
			t.Errorf("the report refers to %q (at %d): %q", bad, i, data[max(0, i-40):min(len(data), i+40)])
		}
	}
	h := text(byID(doc, "header"))
	for _, want := range []string{"cleft " + version, "2026-12-01 09:30 UTC", "site.yaml", "planes.csv", "readings.csv", "SHA-256", "not a substitute"} {
		if !strings.Contains(h, want) {
			t.Errorf("header lacks %q", want)
		}
	}
	lim := text(byID(doc, "limitations"))
	for _, want := range []string{"screening-level", "large uncertainty", "topography", "not a substitute for site investigation"} {
		if !strings.Contains(lim, want) {
			t.Errorf("limitations lack %q", want)
		}
	}
	// Critical and opening rows carry words, not colour alone.
	p := text(byID(doc, "planes"))
	if !strings.Contains(p, "▲ CRITICAL") || !strings.Contains(p, "■ OPENING") {
		t.Error("critical/opening rows are not marked in words")
	}
}

func TestReportSummaryGolden(t *testing.T) {
	dir := demoReport(t)
	got := strings.TrimSpace(text(byID(parseHTML(t, filepath.Join(dir, "report.html")), "summary")))
	path := filepath.Join(testdata, "summary_golden.txt")
	if regen() {
		os.WriteFile(path, []byte(got+"\n"), 0o644)
		return
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run -regen)", err)
	}
	if got != strings.TrimSpace(string(want)) {
		t.Errorf("summary section:\n%s\nwant:\n%s", got, want)
	}
	var f summaryDoc
	readJSON(t, filepath.Join(dir, "summary.json"), &f) // fails on invalid JSON
	if f.Planes != 139 || f.Critical != 1 || f.Opening != 1 || len(f.LeastStable) != 3 || f.LeastStable[0].Name != "F2" || len(f.Limit.ExceededAt) != 0 || len(f.Sets) != 3 || f.Readings != 133 {
		t.Errorf("summary.json = %+v", f)
	}
}

// chromium returns the path of a Chromium binary, or "".
func chromium() string {
	for _, name := range []string{"chromium", "chromium-browser", "google-chrome"} {
		if p, err := exec.LookPath(name); err == nil {
			return p
		}
	}
	return ""
}

// TestReportInBrowser renders the demo report in headless Chromium, takes a
// screenshot and prints it to PDF. It skips when no Chromium is installed,
// unless CLEFT_REQUIRE_BROWSER is set (as .ci/run sets it).
func TestReportInBrowser(t *testing.T) {
	bin := chromium()
	if bin == "" {
		if os.Getenv("CLEFT_REQUIRE_BROWSER") != "" {
			t.Fatal("no Chromium found and CLEFT_REQUIRE_BROWSER is set")
		}
		t.Skip("no Chromium found (install Debian's chromium package to run the browser check)")
	}
	dir := demoReport(t)
	page := "file://" + filepath.Join(dir, "report.html")
	shot, pdfFile := filepath.Join(dir, "shot.png"), filepath.Join(dir, "report.pdf")
	common := []string{"--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking",
		"--disable-component-update", "--disable-sync", "--no-first-run", "--user-data-dir=" + t.TempDir()}
	run := func(args ...string) {
		t.Helper()
		cmd := exec.Command(bin, append(common, args...)...)
		out, err := cmd.CombinedOutput()
		if err != nil {
			t.Fatalf("chromium %v: %v\n%s", args, err, out)
		}
	}
	run("--hide-scrollbars", "--window-size=1200,1600", "--screenshot="+shot, page)
	run("--no-pdf-header-footer", "--print-to-pdf="+pdfFile, page)

	f, err := os.Open(shot)
	if err != nil {
		t.Fatal(err)
	}
	img, err := png.Decode(f)
	f.Close()
	if err != nil {
		t.Fatalf("screenshot: %v", err)
	}
	const minInk = 0.02 // a fraction of the pixels: less is a blank page
	if frac := inked(img); frac < minInk {
		t.Errorf("screenshot is %.1f%% ink: blank?", 100*frac)
	}
	st, err := os.Stat(pdfFile)
	if err != nil {
		t.Fatal(err)
	}
	r, err := pdf.Open(pdfFile)
	if err != nil {
		t.Fatalf("printed PDF: %v", err)
	}
	// Header and summary; the key table, inputs and stress; slope, tunnel
	// and chance; five figures two to a page (the tall chart alone); method,
	// limitations and the appendix: not fewer than five pages, and not a
	// runaway layout (the readings are not listed one by one).
	if n := r.NumPage(); n < 5 || n > 14 {
		t.Errorf("printed PDF has %d pages (%d bytes), want 5 to 14", n, st.Size())
	}
	// Nothing is wider than the page: a browser shrinks the whole report
	// to fit its widest table, and the title (1.55rem, 16 px to the rem:
	// 24.8 px = 18.6 pt) would print smaller.
	const tol = 0.2 // pt
	title := 0.0
	for _, tx := range r.Page(1).Content().Text {
		title = max(title, tx.FontSize)
	}
	if title < 18.6-tol {
		t.Errorf("the title prints at %.2f pt, not 18.6: the report was shrunk to fit a table wider than the page", title)
	}
}

// inked returns the fraction of pixels that are not near-white.
func inked(img image.Image) float64 {
	b := img.Bounds()
	n, ink := 0, 0
	for y := b.Min.Y; y < b.Max.Y; y += 2 {
		for x := b.Min.X; x < b.Max.X; x += 2 {
			r, g, bl, _ := img.At(x, y).RGBA()
			n++
			if r < 0xe000 || g < 0xe000 || bl < 0xe000 {
				ink++
			}
		}
	}
	return float64(ink) / float64(n)
}
