package plots

import (
	"fmt"
	"image/color"
	"io"
	"path/filepath"
	"strings"

	xfont "golang.org/x/image/font"
	"gonum.org/v1/plot"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
	"gonum.org/v1/plot/vg/vgpdf"
	"gonum.org/v1/plot/vg/vgsvg"
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
		c = vgsvg.New(w, h)
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

// titleBlock draws lines of text from the top-left of c: the first bold and
// larger, the others in grey. It returns the height used.
func titleBlock(c *draw.Canvas, lines []string) vg.Length {
	y := c.Max.Y
	x := c.Min.X
	for i, l := range lines {
		sty := textStyle(8, false, grey)
		if i == 0 {
			sty = textStyle(11, true, ink)
		}
		c.FillText(sty, vg.Point{X: x, Y: y}, l)
		y -= sty.Height(l) + 2
	}
	return c.Max.Y - y
}
