// Command benchresolve measures cleft resolve end to end: it builds cleft,
// writes generated planes tables of the requested sizes, runs
// `cleft resolve SITE --planes IN.csv --out OUT.csv` on each and reports the
// rows per second (best of -runs) and the peak resident memory of the
// process. It is a benchmark script, not a test: run it by hand,
//
//	go run ./cmd/benchresolve -rows 10000,1000000
package main

import (
	"bufio"
	"flag"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"strconv"
	"strings"
	"syscall"
	"time"
)

const siteYAML = `site: benchmark site (generated)
stress:
  vertical: {density: 2650}
  shmax: {ratio: 1.35, azimuth: 128}
  shmin: {ratio: 0.72}
water: {table: 18}
strength: {friction: 0.6}
`

func main() {
	rowsFlag := flag.String("rows", "10000,1000000", "comma-separated table sizes")
	runs := flag.Int("runs", 3, "runs per size; the best time is reported")
	format := flag.String("format", "csv", "output format: csv or json")
	flag.Parse()
	dir, err := os.MkdirTemp("", "cleft-bench-")
	check(err)
	defer os.RemoveAll(dir)
	bin := filepath.Join(dir, "cleft")
	build := exec.Command("go", "build", "-o", bin, "./cmd/cleft")
	build.Stdout, build.Stderr = os.Stdout, os.Stderr
	check(build.Run())
	site := filepath.Join(dir, "site.yaml")
	check(os.WriteFile(site, []byte(siteYAML), 0o644))

	fmt.Printf("%10s %10s %14s %12s %10s\n", "rows", "best s", "rows/s", "peak RSS MB", "out MB")
	for _, f := range strings.Split(*rowsFlag, ",") {
		n, err := strconv.Atoi(strings.TrimSpace(f))
		check(err)
		in := filepath.Join(dir, fmt.Sprintf("planes-%d.csv", n))
		check(generate(in, n))
		out := filepath.Join(dir, "out."+*format)
		best, peak := time.Duration(1<<62), int64(0)
		for range *runs {
			cmd := exec.Command(bin, "resolve", site, "--planes", in, "--out", out, "--format", *format)
			cmd.Stderr = os.Stderr
			t0 := time.Now()
			check(cmd.Run())
			el := time.Since(t0)
			best = min(best, el)
			if ru, ok := cmd.ProcessState.SysUsage().(*syscall.Rusage); ok {
				peak = max(peak, ru.Maxrss) // kilobytes on Linux
			}
		}
		st, err := os.Stat(out)
		check(err)
		fmt.Printf("%10d %10.3f %14.0f %12.1f %10.1f\n", n, best.Seconds(), float64(n)/best.Seconds(), float64(peak)/1024, float64(st.Size())/1e6)
		os.Remove(in)
	}
}

// generate writes n planes with a deterministic spread of orientations and
// depths, a name and a set column.
func generate(path string, n int) error {
	f, err := os.Create(path)
	if err != nil {
		return err
	}
	w := bufio.NewWriterSize(f, 1<<20)
	fmt.Fprintln(w, "name,dip,dip_direction,depth,set")
	for i := range n {
		fmt.Fprintf(w, "J%d,%d,%d,%d,S%d\n", i, (i*7)%91, (i*37)%360, 20+(i%50)*5, i%4)
	}
	if err := w.Flush(); err != nil {
		return err
	}
	return f.Close()
}

func check(err error) {
	if err != nil {
		fmt.Fprintln(os.Stderr, "benchresolve:", err)
		os.Exit(1)
	}
}
