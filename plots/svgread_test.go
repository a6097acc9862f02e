package plots

import (
	"bytes"
	"encoding/xml"
	"fmt"
	"io"
	"math"
	"regexp"
	"strconv"
	"strings"

	xfont "golang.org/x/image/font"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"
)

// affine is an SVG transform: x' = a·x + c·y + e, y' = b·x + d·y + f.
type affine [6]float64

var identity = affine{1, 0, 0, 1, 0, 0}

// then returns the transform that applies n first, then m (m·n).
func (m affine) then(n affine) affine {
	return affine{
		m[0]*n[0] + m[2]*n[1], m[1]*n[0] + m[3]*n[1],
		m[0]*n[2] + m[2]*n[3], m[1]*n[2] + m[3]*n[3],
		m[0]*n[4] + m[2]*n[5] + m[4], m[1]*n[4] + m[3]*n[5] + m[5],
	}
}

func (m affine) apply(x, y float64) (float64, float64) {
	return m[0]*x + m[2]*y + m[4], m[1]*x + m[3]*y + m[5]
}

var transformRE = regexp.MustCompile(`(translate|scale|rotate)\(([^)]*)\)`)

// parseTransform reads the translate, scale and rotate functions gonum's
// SVG canvas writes.
func parseTransform(s string) (affine, error) {
	m := identity
	for _, f := range transformRE.FindAllStringSubmatch(s, -1) {
		var v []float64
		for _, a := range strings.FieldsFunc(f[2], func(r rune) bool { return r == ',' || r == ' ' }) {
			x, err := strconv.ParseFloat(a, 64)
			if err != nil {
				return m, fmt.Errorf("transform %q: %v", s, err)
			}
			v = append(v, x)
		}
		var n affine
		switch {
		case f[1] == "translate" && len(v) == 2:
			n = affine{1, 0, 0, 1, v[0], v[1]}
		case f[1] == "translate" && len(v) == 1:
			n = affine{1, 0, 0, 1, v[0], 0}
		case f[1] == "scale" && len(v) == 2:
			n = affine{v[0], 0, 0, v[1], 0, 0}
		case f[1] == "scale" && len(v) == 1:
			n = affine{v[0], 0, 0, v[0], 0, 0}
		case f[1] == "rotate" && len(v) == 1:
			s, c := math.Sincos(v[0] * math.Pi / 180)
			n = affine{c, s, -s, c, 0, 0}
		default:
			return m, fmt.Errorf("transform %q: unexpected %s", s, f[0])
		}
		m = m.then(n)
	}
	return m, nil
}

// rect is an axis-aligned box on the page, SVG user units (pt), y down.
type rect struct{ x0, y0, x1, y1 float64 }

func (r rect) grow(d float64) rect { return rect{r.x0 - d, r.y0 - d, r.x1 + d, r.y1 + d} }

func (r rect) union(o rect) rect {
	return rect{math.Min(r.x0, o.x0), math.Min(r.y0, o.y0), math.Max(r.x1, o.x1), math.Max(r.y1, o.y1)}
}

// overlap returns the area r and o share.
func (r rect) overlap(o rect) float64 {
	w := math.Min(r.x1, o.x1) - math.Max(r.x0, o.x0)
	h := math.Min(r.y1, o.y1) - math.Max(r.y0, o.y0)
	if w <= 0 || h <= 0 {
		return 0
	}
	return w * h
}

// svgText is one text element: its words, fill and glyph box on the page.
type svgText struct {
	text string
	fill string
	box  rect
	x, y float64 // the baseline's start on the page
}

// svgDoc is what the layout tests read from an SVG figure.
type svgDoc struct {
	w, h    float64
	texts   []svgText
	markers []rect // boxes of the plane, axis and set-mean symbols
	images  []string
	colours []string // every fill and stroke colour written
}

var styleRE = regexp.MustCompile(`([a-z-]+):([^;]+)`)

func styleOf(s string) map[string]string {
	out := map[string]string{}
	for _, m := range styleRE.FindAllStringSubmatch(s, -1) {
		out[m[1]] = strings.TrimSpace(m[2])
	}
	return out
}

// faceOf returns the font face an SVG text style names, from gonum's font
// cache: the faces the figures were laid out with.
func faceOf(st map[string]string) (font.Face, error) {
	size, err := strconv.ParseFloat(strings.TrimSuffix(st["font-size"], "px"), 64)
	if err != nil {
		return font.Face{}, fmt.Errorf("font-size %q", st["font-size"])
	}
	// The figure font is the first of the family list.
	first, _, _ := strings.Cut(st["font-family"], ",")
	fam := strings.Fields(strings.Trim(first, "'\""))
	if len(fam) != 2 {
		return font.Face{}, fmt.Errorf("font-family %q", st["font-family"])
	}
	f := font.Font{Typeface: font.Typeface(fam[0]), Variant: font.Variant(fam[1]), Size: vg.Points(size)}
	if st["font-weight"] == "bold" {
		f.Weight = xfont.WeightBold
	}
	if !font.DefaultCache.Has(f) {
		return font.Face{}, fmt.Errorf("no font %v", f)
	}
	return font.DefaultCache.Lookup(f, f.Size), nil
}

// readSVG reads an SVG document written by Write.
func readSVG(data []byte) (*svgDoc, error) {
	doc := &svgDoc{}
	d := xml.NewDecoder(bytes.NewReader(data))
	stack := []affine{identity}
	var open *xml.StartElement // the text element being read
	var ctm affine
	for {
		tok, err := d.Token()
		if err == io.EOF {
			return doc, nil
		}
		if err != nil {
			return nil, err
		}
		switch t := tok.(type) {
		case xml.StartElement:
			at := map[string]string{}
			for _, a := range t.Attr {
				at[a.Name.Local] = a.Value
			}
			m, err := parseTransform(at["transform"])
			if err != nil {
				return nil, err
			}
			top := stack[len(stack)-1].then(m)
			stack = append(stack, top)
			st := styleOf(at["style"])
			for _, k := range []string{"fill", "stroke"} {
				if v, ok := st[k]; ok && v != "none" {
					doc.colours = append(doc.colours, v)
				}
			}
			switch t.Name.Local {
			case "svg":
				doc.w, _ = strconv.ParseFloat(strings.TrimSuffix(at["width"], "pt"), 64)
				doc.h, _ = strconv.ParseFloat(strings.TrimSuffix(at["height"], "pt"), 64)
			case "text":
				open, ctm = &t, top
			case "image":
				doc.images = append(doc.images, at["href"])
			case "path":
				if st["stroke"] == "#111111" || st["fill"] == "#111111" || st["fill"] == "#050505" || st["fill"] == "#080808" {
					doc.markers = append(doc.markers, pathBox(at["d"], top))
				}
			}
		case xml.CharData:
			if open != nil {
				if err := doc.addText(open, ctm, string(t)); err != nil {
					return nil, err
				}
				open = nil
			}
		case xml.EndElement:
			stack = stack[:len(stack)-1]
			open = nil
		}
	}
}

// addText adds a text element's glyph box: from its baseline start (x, y)
// in its own coordinates, the font's advance width of its words, and the
// font's ascent above and descent below the baseline, through the element's
// transform.
func (doc *svgDoc) addText(e *xml.StartElement, m affine, s string) error {
	at := map[string]string{}
	for _, a := range e.Attr {
		at[a.Name.Local] = a.Value
	}
	x, err1 := strconv.ParseFloat(at["x"], 64)
	y, err2 := strconv.ParseFloat(at["y"], 64)
	if err1 != nil || err2 != nil {
		return fmt.Errorf("text %q at %q, %q", s, at["x"], at["y"])
	}
	st := styleOf(at["style"])
	face, err := faceOf(st)
	if err != nil {
		return fmt.Errorf("text %q: %v", s, err)
	}
	w := face.Width(s).Points()
	ext := face.Extents()
	// Text coordinates are y down: the glyphs rise above the baseline.
	corners := [4][2]float64{{x, y - ext.Ascent.Points()}, {x + w, y - ext.Ascent.Points()}, {x, y + ext.Descent.Points()}, {x + w, y + ext.Descent.Points()}}
	b := rect{math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)}
	for _, c := range corners {
		px, py := m.apply(c[0], c[1])
		b = b.union(rect{px, py, px, py})
	}
	bx, by := m.apply(x, y)
	fill := st["fill"]
	if fill == "" {
		fill = "#000000"
	}
	doc.texts = append(doc.texts, svgText{text: s, fill: fill, box: b, x: bx, y: by})
	return nil
}

var pathNum = regexp.MustCompile(`[MLAZ]|-?[0-9.]+(?:e-?[0-9]+)?`)

// pathBox returns the page box of a path of M, L, A and Z commands: its
// points, and round every arc the circle through its ends of the arc's
// radius centred between them (gonum draws circles as two half arcs).
func pathBox(d string, m affine) rect {
	b := rect{math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)}
	add := func(x, y, r float64) {
		px, py := m.apply(x, y)
		b = b.union(rect{px - r, py - r, px + r, py + r})
	}
	tok := pathNum.FindAllString(d, -1)
	var cx, cy float64
	num := func(i int) float64 { v, _ := strconv.ParseFloat(tok[i], 64); return v }
	for i := 0; i < len(tok); {
		switch tok[i] {
		case "M", "L":
			cx, cy = num(i+1), num(i+2)
			add(cx, cy, 0)
			i += 3
		case "A":
			r := num(i + 1)
			x, y := num(i+6), num(i+7)
			add((cx+x)/2, (cy+y)/2, r)
			cx, cy = x, y
			i += 8
		default:
			i++
		}
	}
	return b
}
