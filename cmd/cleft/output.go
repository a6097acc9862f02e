package main

import (
	"bufio"
	"bytes"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"runtime"
	"strconv"
	"strings"

	"cleft/plots"
	"cleft/plots/table"

	"gonum.org/v1/plot/vg"
)

// writeFile writes path through fn atomically: into a temporary file in the
// same folder (.NAME.PID-RANDOM.tmp), renamed over path only when fn and
// every write succeeded, so a failed run never leaves a half-written output
// and the temporary file is removed however fn ends, a panic included.
// Temporary files in the folder left by runs that were killed (their
// process is gone) are removed first. A failed write names path, not the temporary
// file.
func writeFile(path string, fn func(w io.Writer) error) (err error) {
	dir := filepath.Dir(path)
	removeStale(dir, filepath.Base(path))
	tmp, err := os.CreateTemp(dir, tempPrefix(filepath.Base(path))+strconv.Itoa(os.Getpid())+"-*.tmp")
	if err != nil {
		return fmt.Errorf("%s: cannot write: %w", path, unwrapPath(err))
	}
	done := false
	defer func() {
		if !done {
			tmp.Close()
			os.Remove(tmp.Name())
		}
	}()
	bw := bufio.NewWriterSize(tmp, 1<<16)
	if err = fn(bw); err != nil {
		return outputError(path, tmp.Name(), err)
	}
	if err = bw.Flush(); err != nil {
		return outputError(path, tmp.Name(), err)
	}
	if err = tmp.Chmod(0o644); err != nil {
		return outputError(path, tmp.Name(), err)
	}
	if err = tmp.Close(); err != nil {
		return outputError(path, tmp.Name(), err)
	}
	if err = os.Rename(tmp.Name(), path); err != nil {
		return fmt.Errorf("%s: cannot write: %w", path, unwrapPath(err))
	}
	done = true
	return nil
}

// tempPrefix is the start of the names of path's temporary files: the
// hidden name, then the writer's process id.
func tempPrefix(base string) string { return "." + base + "." }

// outputError is err from writing the temporary file tmp of path, as the
// user should read it: about path (a full disk says "no space left on
// device" of the output, not of a hidden file). Other errors (a bad input
// row, say) pass through.
func outputError(path, tmp string, err error) error {
	var pe *os.PathError
	if errors.As(err, &pe) && pe.Path == tmp {
		return fmt.Errorf("%s: cannot write: %w", path, pe.Err)
	}
	return err
}

// removeStale removes the temporary files in dir that no running process is
// writing: any .NAME.PID-RANDOM.tmp (cleft's own pattern) of a process that
// is gone, and .BASE.RANDOM.tmp of base written by earlier versions. Errors
// are ignored: it is tidying.
func removeStale(dir, base string) {
	entries, err := os.ReadDir(dir)
	if err != nil {
		return
	}
	old := tempPrefix(base)
	for _, e := range entries {
		name := e.Name()
		rest, ok := strings.CutSuffix(name, ".tmp")
		if !ok || e.IsDir() || !strings.HasPrefix(name, ".") {
			continue
		}
		if r, ok := strings.CutPrefix(rest, old); ok && digits(r) { // an earlier version's
			os.Remove(filepath.Join(dir, name))
			continue
		}
		i := strings.LastIndexByte(rest, '.')
		pid, random, ok := strings.Cut(rest[i+1:], "-")
		if i <= 0 || !ok || !digits(pid) || !digits(random) {
			continue
		}
		if n, err := strconv.Atoi(pid); err == nil && !processAlive(n) {
			os.Remove(filepath.Join(dir, name))
		}
	}
}

// digits reports whether s is one or more ASCII digits.
func digits(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] < '0' || s[i] > '9' {
			return false
		}
	}
	return s != ""
}

func unwrapPath(err error) error {
	if pe, ok := err.(*os.PathError); ok {
		return pe.Err
	}
	return err
}

// namedTable is an output file and the function that writes it.
type namedTable struct {
	name  string
	write func(io.Writer) error
}

// csvTable is a namedTable of rows written as CSV.
func csvTable(name string, rows [][]string) namedTable {
	return namedTable{name, func(w io.Writer) error { return table.WriteCSV(w, rows) }}
}

// outputs collects the paths written into one folder.
type outputs struct {
	dir   string
	wrote []string
}

// tables writes each table into the folder.
func (o *outputs) tables(ts ...namedTable) error {
	for _, t := range ts {
		p := filepath.Join(o.dir, t.name)
		if err := writeFile(p, t.write); err != nil {
			return err
		}
		o.wrote = append(o.wrote, p)
	}
	return nil
}

// namedFigure is a figure with its file name (without extension), its size,
// and for the report its title and caption.
type namedFigure struct {
	file           string
	title, caption string
	fig            plots.Figure
	w, h           vg.Length
	svg            []byte // the SVG document, once written
}

// figures writes each figure into the folder as SVG and PNG, keeping the
// SVG bytes for the report. The figures are drawn concurrently, one
// goroutine per CPU, and written in order, so that the files and the list
// of paths are those of drawing them one after the other; on an error the
// figures before the failing one are written, as they would be then.
func (o *outputs) figures(figs []*namedFigure) error {
	formats := []string{"svg", "png"}
	type drawn struct {
		b    bytes.Buffer
		err  error
		done chan struct{}
	}
	out := make([]drawn, len(figs)*len(formats))
	jobs := make(chan int, len(out))
	for i := range out {
		out[i].done = make(chan struct{})
		jobs <- i
	}
	close(jobs)
	for range min(runtime.GOMAXPROCS(0), len(out)) {
		go func() {
			for i := range jobs {
				f, d := figs[i/len(formats)], &out[i]
				d.err = plots.Write(f.fig, f.w, f.h, formats[i%len(formats)], &d.b)
				close(d.done)
			}
		}()
	}
	defer func() { // let the drawing finish before returning
		for i := range out {
			<-out[i].done
		}
	}()
	for i, f := range figs {
		for j, format := range formats {
			d := &out[i*len(formats)+j]
			<-d.done
			p := filepath.Join(o.dir, f.file+"."+format)
			if d.err != nil {
				if format == "svg" {
					return fmt.Errorf("%s: %w", f.file, d.err)
				}
				return fmt.Errorf("%s: %w", p, d.err)
			}
			data := d.b.Bytes()
			if format == "svg" {
				f.svg = data
			}
			if err := writeFile(p, func(w io.Writer) error { _, err := w.Write(data); return err }); err != nil {
				return err
			}
			o.wrote = append(o.wrote, p)
		}
	}
	return nil
}

// names returns the file names written.
func (o *outputs) names() []string {
	out := make([]string, len(o.wrote))
	for i, p := range o.wrote {
		out[i] = filepath.Base(p)
	}
	return out
}

// writeFigure writes f to path in the format its extension names.
func writeFigure(f plots.Figure, w, h vg.Length, path string) error {
	format, err := plots.FormatOf(path)
	if err != nil {
		return usageError{err}
	}
	return writeFile(path, func(out io.Writer) error {
		if err := plots.Write(f, w, h, format, out); err != nil {
			return fmt.Errorf("%s: %w", path, err)
		}
		return nil
	})
}

func cm(v, def float64) vg.Length {
	if v == 0 {
		v = def
	}
	return vg.Length(v) * vg.Centimeter
}
