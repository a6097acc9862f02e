package plots

import (
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/vgpdf"

	xfont "golang.org/x/image/font"
	"golang.org/x/image/font/sfnt"
	"golang.org/x/image/math/fixed"
)

// outlinePDF is a PDF canvas that draws text as filled glyph outlines.
// gonum's PDF backend encodes text in code page 1252, which has no Greek
// (σ, τ, μ, φ are on every figure) and mislabels bold faces; outlines
// render every glyph of the font exactly, and the PDF needs no fonts.
type outlinePDF struct {
	*vgpdf.Canvas
	buf sfnt.Buffer
}

// FillString fills the outlines of str's glyphs, with the baseline starting
// at pt, in the current colour.
func (c *outlinePDF) FillString(f font.Face, pt vg.Point, str string) {
	if f.Font.Size == 0 || f.Face == nil {
		return
	}
	sf := f.Face
	ppem := fixed.Int26_6(f.Font.Size.Points() * 64)
	var path vg.Path
	x := pt.X
	var prev sfnt.GlyphIndex
	at := func(p fixed.Point26_6) vg.Point {
		return vg.Point{X: x + vg.Length(p.X)/64, Y: pt.Y - vg.Length(p.Y)/64}
	}
	for i, r := range str {
		gi, err := sf.GlyphIndex(&c.buf, r)
		if err != nil {
			continue
		}
		if i > 0 {
			if k, err := sf.Kern(&c.buf, prev, gi, ppem, xfont.HintingNone); err == nil {
				x += vg.Length(k) / 64
			}
		}
		segs, err := sf.LoadGlyph(&c.buf, gi, ppem, nil)
		if err == nil {
			for _, s := range segs {
				switch s.Op {
				case sfnt.SegmentOpMoveTo:
					if len(path) > 0 {
						path.Close()
					}
					path.Move(at(s.Args[0]))
				case sfnt.SegmentOpLineTo:
					path.Line(at(s.Args[0]))
				case sfnt.SegmentOpQuadTo:
					path.QuadTo(at(s.Args[0]), at(s.Args[1]))
				case sfnt.SegmentOpCubeTo:
					path.CubeTo(at(s.Args[0]), at(s.Args[1]), at(s.Args[2]))
				}
			}
			if len(path) > 0 {
				path.Close()
			}
		}
		if adv, err := sf.GlyphAdvance(&c.buf, gi, ppem, xfont.HintingNone); err == nil {
			x += vg.Length(adv) / 64
		}
		prev = gi
	}
	if len(path) > 0 {
		c.Fill(path)
	}
}
