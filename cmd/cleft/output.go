package main

import (
	"bufio"
	"encoding/csv"
	"fmt"
	"io"
	"os"
	"path/filepath"
)

// writeFile writes path through fn atomically: into a temporary file in the
// same folder, renamed over path only when fn and every write succeeded, so
// a failed run never leaves a half-written output.
func writeFile(path string, fn func(w io.Writer) error) (err error) {
	dir := filepath.Dir(path)
	tmp, err := os.CreateTemp(dir, "."+filepath.Base(path)+".*.tmp")
	if err != nil {
		return fmt.Errorf("%s: cannot write: %w", path, unwrapPath(err))
	}
	defer func() {
		if err != nil {
			tmp.Close()
			os.Remove(tmp.Name())
		}
	}()
	bw := bufio.NewWriterSize(tmp, 1<<16)
	if err = fn(bw); err != nil {
		return err
	}
	if err = bw.Flush(); err != nil {
		return fmt.Errorf("%s: %w", path, err)
	}
	if err = tmp.Chmod(0o644); err != nil {
		return fmt.Errorf("%s: %w", path, err)
	}
	if err = tmp.Close(); err != nil {
		return fmt.Errorf("%s: %w", path, err)
	}
	if err = os.Rename(tmp.Name(), path); err != nil {
		return fmt.Errorf("%s: %w", path, err)
	}
	return nil
}

func unwrapPath(err error) error {
	if pe, ok := err.(*os.PathError); ok {
		return pe.Err
	}
	return err
}

// writeCSV writes rows with encoding/csv.
func writeCSV(w io.Writer, rows [][]string) error {
	cw := csv.NewWriter(w)
	if err := cw.WriteAll(rows); err != nil {
		return err
	}
	return cw.Error()
}

// namedTable is an output file and the function that writes it.
type namedTable struct {
	name  string
	write func(io.Writer) error
}

// writeTables writes each table into dir; wrote, if not nil, collects the
// paths.
func writeTables(dir string, ts []namedTable, wrote *[]string) error {
	for _, t := range ts {
		p := filepath.Join(dir, t.name)
		if err := writeFile(p, t.write); err != nil {
			return err
		}
		if wrote != nil {
			*wrote = append(*wrote, p)
		}
	}
	return nil
}

// writeFigures writes each figure into dir as SVG and PNG; wrote, if not
// nil, collects the paths.
func writeFigures(dir string, figs []namedFigure, wrote *[]string) error {
	for _, f := range figs {
		for _, ext := range []string{".svg", ".png"} {
			p := filepath.Join(dir, f.file+ext)
			if err := writeFigure(f.Figure, f.W, f.H, p); err != nil {
				return err
			}
			if wrote != nil {
				*wrote = append(*wrote, p)
			}
		}
	}
	return nil
}

// baseNames returns the file names of paths.
func baseNames(paths []string) []string {
	out := make([]string, len(paths))
	for i, p := range paths {
		out[i] = filepath.Base(p)
	}
	return out
}
