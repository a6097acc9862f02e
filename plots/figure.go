package plots

import (
	"fmt"
	"image/color"
	"io"
	"path/filepath"
	"strings"
	"sync"

	xfont "golang.org/x/image/font"
	"gonum.org/v1/plot"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
	"gonum.org/v1/plot/vg/vgpdf"
)

// Figure draws itself on a canvas.
type Figure interface {
	Draw(c draw.Canvas)
}

// FormatOf returns the output format named by a file's extension: "png",
// "svg" or "pdf".
func FormatOf(path string) (string, error) {
	ext := strings.ToLower(strings.TrimPrefix(filepath.Ext(path), "."))
	switch ext {
	case "png", "svg", "pdf":
		return ext, nil
	}
	return "", fmt.Errorf("%s: want a .png, .svg or .pdf file name", path)
}

// PNGDPI is the resolution of PNG figures.
const PNGDPI = 150

// Write draws f on a w × h canvas and writes it to out in format ("png",
// "svg" or "pdf"). PNGs have a white background at PNGDPI and are compressed
// at deflate's fastest level (pngEncoder).
func Write(f Figure, w, h vg.Length, format string, out io.Writer) error {
	var c vg.CanvasWriterTo
	switch format {
	case "png":
		img := vgimg.NewWith(vgimg.UseWH(w, h), vgimg.UseDPI(PNGDPI), vgimg.UseBackgroundColor(color.White))
		f.Draw(draw.New(img))
		return writePNG(out, img.Image())
	case "svg":
		c = newSVG(w, h)
	case "pdf":
		c = &outlinePDF{Canvas: vgpdf.New(w, h)}
	default:
		return fmt.Errorf("plots: unknown format %q", format)
	}
	dc := draw.New(c)
	dc.SetColor(color.White)
	dc.Fill(dc.Rectangle.Path())
	f.Draw(dc)
	_, err := c.WriteTo(out)
	return err
}

// Text styles of the figures: Liberation Sans, from gonum/plot's fonts.
func textStyle(size vg.Length, bold bool, clr color.Color) draw.TextStyle {
	fnt := font.Font{Typeface: "Liberation", Variant: "Sans", Size: size}
	if bold {
		fnt.Weight = xfont.WeightBold
	}
	return text.Style{Color: clr, Font: fnt, Handler: plot.DefaultTextHandler, XAlign: draw.XLeft, YAlign: draw.YTop}
}

var (
	ink     = color.NRGBA{R: 0x1a, G: 0x1a, B: 0x1a, A: 0xff}
	grey    = color.NRGBA{R: 0x70, G: 0x70, B: 0x70, A: 0xff}
	light   = color.NRGBA{R: 0xc8, G: 0xc8, B: 0xc8, A: 0xff}
	white   = color.NRGBA{R: 0xff, G: 0xff, B: 0xff, A: 0xff}
	warning = color.NRGBA{R: 0xb0, G: 0x1c, B: 0x1c, A: 0xff} // the FS = 1 line's dashes
)

// Room the layout keeps for a reader without Liberation Sans or a font of
// its metrics (Arimo, Arial, Helvetica): the common fallback, DejaVu Sans,
// sets text about 15 % wider, its bold about 20 % wider (measured on the
// figures' words). Texts start at the left of the room kept for them.
const (
	fontSlack     = 1.15
	boldFontSlack = 1.22
)

// textWidth returns the width the layout keeps for txt in sty: its advance
// width in the figure font, widened by the slack for fallback fonts.
func textWidth(sty draw.TextStyle, txt string) vg.Length {
	k := widthKey{sty.Font.Typeface, sty.Font.Variant, sty.Font.Style, sty.Font.Weight, sty.Font.Size, txt}
	if w, ok := widths.Load(k); ok {
		return w.(vg.Length)
	}
	w := sty.Width(txt) * fontSlack
	if sty.Font.Weight >= xfont.WeightBold {
		w = sty.Width(txt) * boldFontSlack
	}
	widths.Store(k, w)
	return w
}

// widths keeps the widths textWidth has measured: the layouts measure the
// same words again and again while they try sizes and places, and a
// font's Width walks every glyph. Shared by the figures drawn at once.
var widths sync.Map

// widthKey is a text in a font.
type widthKey struct {
	typeface font.Typeface
	variant  font.Variant
	style    xfont.Style
	weight   xfont.Weight
	size     vg.Length
	text     string
}

// textBox returns the size of the box the layout keeps for txt in sty: its
// width (textWidth) and the font's ascent plus descent.
func textBox(sty draw.TextStyle, txt string) (w, h vg.Length) {
	e := sty.Handler.Extents(sty.Font)
	return textWidth(sty, txt), e.Ascent + e.Descent
}

// boxOf returns the glyph box of txt in sty with its top-left corner at
// (x, top).
func boxOf(sty draw.TextStyle, x, top vg.Length, txt string) vg.Rectangle {
	w, h := textBox(sty, txt)
	return vg.Rectangle{Min: vg.Point{X: x, Y: top - h}, Max: vg.Point{X: x + w, Y: top}}
}

// putText draws txt in sty with its glyph box's top-left corner at (x, top),
// whatever the style's alignment: the baseline lies one ascent below top.
func putText(c *draw.Canvas, sty draw.TextStyle, x, top vg.Length, txt string) {
	e := sty.Handler.Extents(sty.Font)
	// gonum puts the baseline of one line at y + Height·YAlign − Ascent +
	// Size; with YAlign = YBottom (0) the baseline is y − Ascent + Size.
	base := top - e.Ascent
	sty.XAlign, sty.YAlign, sty.Rotation = draw.XLeft, draw.YBottom, 0
	c.FillText(sty, vg.Point{X: x, Y: base + e.Ascent - sty.Font.Size}, txt)
}

// haloSize is how far the white halo of a label reaches beyond its glyphs.
const haloSize = 0.8

// putHalo draws txt like putText over a white halo, so that it reads over
// lines and the raster; the halo reaches haloSize beyond the glyph box.
func putHalo(c *draw.Canvas, sty draw.TextStyle, x, top vg.Length, txt string) {
	h := sty
	h.Color = white
	for _, d := range [4][2]vg.Length{{-haloSize, 0}, {haloSize, 0}, {0, -haloSize}, {0, haloSize}} {
		putText(c, h, x+d[0], top+d[1], txt)
	}
	putText(c, sty, x, top, txt)
}

// wrap breaks txt at spaces into lines no wider than w in sty; a word wider
// than w is broken between letters. An empty txt gives no lines.
func wrap(sty draw.TextStyle, txt string, w vg.Length) []string {
	var lines []string
	line := ""
	for _, word := range strings.Fields(txt) {
		try := word
		if line != "" {
			try = line + " " + word
		}
		if textWidth(sty, try) <= w {
			line = try
			continue
		}
		if line != "" {
			lines = append(lines, line)
		}
		line = ""
		for textWidth(sty, word) > w && len([]rune(word)) > 1 {
			r := []rune(word)
			k := len(r) - 1
			for k > 1 && textWidth(sty, string(r[:k])) > w {
				k--
			}
			lines = append(lines, string(r[:k]))
			word = string(r[k:])
		}
		line = word
	}
	if line != "" {
		lines = append(lines, line)
	}
	return lines
}

// textLines are lines of text, each in its own style, drawn one under the
// other with gap between them.
type textLines struct {
	sty   []draw.TextStyle
	lines []string
	gap   vg.Length
}

// add appends txt wrapped to w in sty.
func (t *textLines) add(sty draw.TextStyle, txt string, w vg.Length) {
	for _, l := range wrap(sty, txt, w) {
		t.sty = append(t.sty, sty)
		t.lines = append(t.lines, l)
	}
}

// height returns the height of the lines.
func (t *textLines) height() vg.Length {
	var h vg.Length
	for i, l := range t.lines {
		_, lh := textBox(t.sty[i], l)
		h += lh
		if i > 0 {
			h += t.gap
		}
	}
	return h
}

// width returns the width of the widest line.
func (t *textLines) width() vg.Length {
	var w vg.Length
	for i, l := range t.lines {
		w = max(w, textWidth(t.sty[i], l))
	}
	return w
}

// draw draws the lines from (x, top) down and returns the height used.
func (t *textLines) draw(c *draw.Canvas, x, top vg.Length) vg.Length {
	y := top
	for i, l := range t.lines {
		if i > 0 {
			y -= t.gap
		}
		putText(c, t.sty[i], x, y, l)
		_, lh := textBox(t.sty[i], l)
		y -= lh
	}
	return top - y
}

// titleLines are a figure's title lines wrapped to w: the first (the site)
// bold and larger, the others in grey.
func titleLines(l look, lines []string, w vg.Length) *textLines {
	t := &textLines{gap: l.pt(1.5)}
	for i, s := range lines {
		sty := l.text(8, 5.5, false, grey)
		if i == 0 {
			sty = l.text(11, 7.5, true, ink)
		}
		t.add(sty, s, w)
	}
	return t
}
