package main

import (
	"fmt"
	"io"
	"os"
	"path/filepath"

	"cleft/planes/site"
)

// refuseInputs returns a usage error when an output path is, or links to,
// one of the run's input files, so that no run can overwrite what it reads
// (cleft resolve site.yaml --planes field.csv --out field.csv). Inputs that
// are "" or "-" (standard input) or do not exist are skipped, and so are
// outputs that do not exist yet.
func refuseInputs(outs []string, ins ...string) error {
	for _, in := range ins {
		if in == "" || in == "-" {
			continue
		}
		fi, err := os.Stat(in)
		if err != nil {
			continue
		}
		for _, out := range outs {
			if fo, err := os.Stat(out); err == nil && os.SameFile(fi, fo) {
				if out == in {
					return usagef("%s is an input of this run: the output would replace it; write the output elsewhere", out)
				}
				return usagef("%s is the input %s: the output would replace it; write the output elsewhere", out, in)
			}
		}
	}
	return nil
}

// siteInputs are the files a loaded site reads besides the site file: its
// planes, readings and cover tables.
func siteInputs(s *site.Site) []string {
	if s == nil {
		return nil
	}
	return []string{s.File, s.PlanesFile, s.ReadingsFile, s.CoverFile}
}

// inDir is each of names in folder dir.
func inDir(dir string, names []string) []string {
	out := make([]string, len(names))
	for i, n := range names {
		out[i] = filepath.Join(dir, n)
	}
	return out
}

// figureFiles are the SVG and PNG files of figures named base.
func figureFiles(bases ...string) []string {
	var out []string
	for _, b := range bases {
		out = append(out, b+".svg", b+".png")
	}
	return out
}

// The files each command may write into its --out folder.
func setsFiles() []string {
	return append([]string{"sets.csv", "readings.csv"}, figureFiles("sets-density")...)
}

func slopeFiles() []string {
	return append([]string{"slope.csv", "slope-readings.csv"}, figureFiles("slope-kinematic")...)
}

func tunnelFiles() []string {
	return append([]string{"stations.csv", "wall.csv", "profile.csv", "zones.csv"}, figureFiles("tunnel-profile", "tunnel-section", "tunnel-wall")...)
}

func chanceFiles() []string {
	return append([]string{"cases.csv", "chance.csv", "sensitivity.csv", "chance-slope.csv", "chance-tunnel.csv"}, figureFiles("chance-stereonet", "chance-sensitivity")...)
}

func assessFiles() []string {
	out := []string{"planes.csv", "planes.json", "stress.json", "report.html", "summary.json", "sets.csv", manifestName}
	out = append(out, figureFiles("stereonet-slip", "stereonet-dilation", "mohr", "sets-density")...)
	out = append(out, slopeFiles()...)
	out = append(out, chanceFiles()...)
	return append(out, tunnelFiles()...)
}

// warnRepeats warns on w of plane names given more than once (first is the
// first repeat, n the planes named like an earlier one): a warning, not an
// error, as the tables keep every plane in input order; but a name no
// longer tells the planes apart in the figures and the report.
func warnRepeats(w io.Writer, first *site.Error, n int, unchecked bool) {
	if first == nil || w == nil {
		return
	}
	more := ""
	if n > 1 {
		more = fmt.Sprintf(" (%d planes are named like an earlier one)", n)
	}
	if unchecked {
		more += fmt.Sprintf("; names after the first %d planes were not checked", site.MaxNameCheck)
	}
	fmt.Fprintf(w, "cleft: warning: %s\n", site.OneLine(first.Error()+more))
}
