package plots

import (
	"bytes"
	"image/color"
	"io"

	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/vgsvg"
)

// svgCanvas is gonum's SVG canvas made acceptable to strict SVG readers:
//   - a fully transparent colour draws nothing (gonum would write it as
//     "#-8000000000000000…", from 0/0 when it divides out the alpha);
//   - embedded raster images are labelled image/png, which they are (gonum
//     encodes PNG but labels it image/jpg);
//   - the figure font is followed by fonts of the same metrics and a
//     generic family, so that a reader without it keeps the layout.
type svgCanvas struct {
	*vgsvg.Canvas
	clear bool   // the current colour is fully transparent
	stack []bool // clear, saved by Push
}

func newSVG(w, h vg.Length) *svgCanvas { return &svgCanvas{Canvas: vgsvg.New(w, h)} }

func (c *svgCanvas) SetColor(clr color.Color) {
	c.clear = false
	if clr != nil {
		if _, _, _, a := clr.RGBA(); a == 0 {
			c.clear = true
			return // keep the last visible colour: nothing is drawn meanwhile
		}
	}
	c.Canvas.SetColor(clr)
}

func (c *svgCanvas) Push() {
	c.stack = append(c.stack, c.clear)
	c.Canvas.Push()
}

func (c *svgCanvas) Pop() {
	if n := len(c.stack); n > 0 {
		c.clear = c.stack[n-1]
		c.stack = c.stack[:n-1]
	}
	c.Canvas.Pop()
}

func (c *svgCanvas) Stroke(p vg.Path) {
	if !c.clear {
		c.Canvas.Stroke(p)
	}
}

func (c *svgCanvas) Fill(p vg.Path) {
	if !c.clear {
		c.Canvas.Fill(p)
	}
}

func (c *svgCanvas) FillString(f font.Face, pt vg.Point, s string) {
	if !c.clear {
		c.Canvas.FillString(f, pt, s)
	}
}

// How gonum labels an embedded image and names the figure font, and how
// they are written instead: text content cannot hold these, since gonum
// escapes quotes and semicolons do not occur in its styles' text.
var (
	jpgLabel = []byte(`xlink:href="data:image/jpg;base64,`)
	pngLabel = []byte(`xlink:href="data:image/png;base64,`)
	oneFont  = []byte(`font-family:Liberation Sans;`)
	fallback = []byte(`font-family:'Liberation Sans',Arimo,Arial,Helvetica,sans-serif;`)
)

// WriteTo writes the SVG document with its images labelled image/png and
// its font followed by the fonts of the same metrics, then any sans-serif.
func (c *svgCanvas) WriteTo(w io.Writer) (int64, error) {
	var b bytes.Buffer
	if _, err := c.Canvas.WriteTo(&b); err != nil {
		return 0, err
	}
	out := bytes.ReplaceAll(b.Bytes(), jpgLabel, pngLabel)
	out = bytes.ReplaceAll(out, oneFont, fallback)
	n, err := w.Write(out)
	return int64(n), err
}
