// Command benchresolve measures cleft end to end: it builds cleft (or takes
// -bin), writes the generated inputs each job needs, runs each job -runs
// times as a child process and reports the median and best wall time, the
// median CPU time (user and system, less disturbed than the wall time on a
// shared machine), the peak resident memory of the process, and the ratios
// of the medians to a baseline: the figures recorded on main before the
// speed-ups (baseline.go), or, with -base OLD-BINARY, those of the same job
// run by that binary in turn with the new one (paired runs). It is a
// benchmark script, not a test: run it by hand,
//
//	go run ./cmd/benchresolve                          # every job
//	go run ./cmd/benchresolve -jobs sets-100k,resolve-1m -runs 5
//	go run ./cmd/benchresolve -rows 10000,1000000 -format json
//
// The jobs are assess (cleft assess --example --out DIR), sets-N (cleft sets
// on N generated readings with --out DIR), resolve-N (cleft resolve on N
// generated planes, CSV in, CSV or JSON out) and floor-N (a program that
// only reads the same N planes and writes a table of the same shape, the
// floor cleft resolve is compared with). N is a count such as 10000, 10k
// or 1m.
package main

import (
	"bytes"
	"flag"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"slices"
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

const defaultJobs = "assess,sets-10k,sets-100k,sets-1m,resolve-1m,floor-1m"

func main() {
	jobsFlag := flag.String("jobs", defaultJobs, "comma-separated jobs: assess, sets-N, resolve-N, floor-N")
	rowsFlag := flag.String("rows", "", "comma-separated plane counts: run resolve-N for each instead of -jobs")
	runs := flag.Int("runs", 3, "runs per job; the median and the best are reported")
	format := flag.String("format", "csv", "output format of resolve: csv or json")
	bin := flag.String("bin", "", "cleft binary to measure (default: build ./cmd/cleft)")
	base := flag.String("base", "", "baseline cleft binary, run in turn with the measured one")
	floorIO := flag.String("floor", "", "IN,OUT: run the I/O floor on IN (used by the floor jobs)")
	input := flag.String("input", "", "JOB,PATH: write the input of JOB to PATH and stop (for profiling by hand)")
	flag.Parse()
	if *input != "" {
		name, path, _ := strings.Cut(*input, ",")
		j, err := parseJob(name, *format)
		check(err)
		check(j.write(path))
		return
	}
	if *floorIO != "" {
		in, out, _ := strings.Cut(*floorIO, ",")
		check(floor(in, out))
		return
	}
	names := strings.Split(*jobsFlag, ",")
	if *rowsFlag != "" {
		names = nil
		for _, r := range strings.Split(*rowsFlag, ",") {
			names = append(names, "resolve-"+strings.TrimSpace(r))
		}
	}
	var jobs []job
	for _, n := range names {
		j, err := parseJob(strings.TrimSpace(n), *format)
		check(err)
		jobs = append(jobs, j)
	}
	dir, err := os.MkdirTemp("", "cleft-bench-")
	check(err)
	defer os.RemoveAll(dir)
	if *bin == "" {
		*bin = filepath.Join(dir, "cleft")
		build := exec.Command("go", "build", "-o", *bin, "./cmd/cleft")
		build.Stdout, build.Stderr = os.Stdout, os.Stderr
		check(build.Run())
	}
	self, err := os.Executable()
	check(err)
	check(os.WriteFile(filepath.Join(dir, "site.yaml"), []byte(siteYAML), 0o644))

	against := "recorded " + baselineDate
	if *base != "" {
		against = "paired, " + filepath.Base(*base)
	}
	fmt.Printf("%-12s %9s %9s %8s %8s %10s %9s %10s %7s %9s  (baseline: %s)\n", "job", "median s", "best s", "cpu s", "RSS MB", "rows/s", "base s", "base cpu s", "ratio", "cpu ratio", against)
	for _, j := range jobs {
		check(j.prepare(dir))
		bins := []string{*bin}
		if *base != "" && j.kind != "floor" {
			bins = append(bins, *base)
		}
		times := make([][]float64, len(bins))
		cpus := make([][]float64, len(bins))
		rss := make([]int64, len(bins))
		for range *runs {
			for b, exe := range bins {
				if j.kind == "floor" {
					exe = self
				}
				el, cpu, kb := run(exe, j.args(dir))
				times[b] = append(times[b], el)
				cpus[b] = append(cpus[b], cpu)
				rss[b] = max(rss[b], kb)
			}
		}
		med, best, cpu := median(times[0]), slices.Min(times[0]), median(cpus[0])
		baseS, baseCPU, ratio, cpuRatio := "", "", "", ""
		ref, refCPU := recorded[j.name], recordedCPU[j.name]
		if len(bins) > 1 {
			ref, refCPU = median(times[1]), median(cpus[1])
		}
		if ref > 0 {
			baseS, ratio = fmt.Sprintf("%.3f", ref), fmt.Sprintf("%.3f", med/ref)
		}
		if refCPU > 0 {
			baseCPU, cpuRatio = fmt.Sprintf("%.2f", refCPU), fmt.Sprintf("%.3f", cpu/refCPU)
		}
		perS := ""
		if j.n > 0 {
			perS = fmt.Sprintf("%.0f", float64(j.n)/med)
		}
		fmt.Printf("%-12s %9.3f %9.3f %8.2f %8.1f %10s %9s %10s %7s %9s\n", j.name, med, best, cpu, float64(rss[0])/1024, perS, baseS, baseCPU, ratio, cpuRatio)
		j.cleanup(dir)
	}
}

// job is one measured command line.
type job struct {
	name, kind string
	n          int
	format     string
}

func parseJob(name, format string) (job, error) {
	if name == "assess" {
		return job{name: name, kind: name}, nil
	}
	kind, count, ok := strings.Cut(name, "-")
	if !ok || (kind != "sets" && kind != "resolve" && kind != "floor") {
		return job{}, fmt.Errorf("job %q: want assess, sets-N, resolve-N or floor-N", name)
	}
	mult := 1
	switch {
	case strings.HasSuffix(count, "k"):
		mult, count = 1000, strings.TrimSuffix(count, "k")
	case strings.HasSuffix(count, "m"):
		mult, count = 1000000, strings.TrimSuffix(count, "m")
	}
	n, err := strconv.Atoi(count)
	if err != nil || n < 1 {
		return job{}, fmt.Errorf("job %q: want a count such as 10000, 10k or 1m", name)
	}
	return job{name: name, kind: kind, n: n * mult, format: format}, nil
}

func (j job) input(dir string) string {
	return filepath.Join(dir, fmt.Sprintf("%s-%d.csv", j.kind, j.n))
}

func (j job) prepare(dir string) error { return j.write(j.input(dir)) }

// write writes the job's input to path (nothing for assess).
func (j job) write(path string) error {
	switch j.kind {
	case "sets":
		return generateReadings(path, j.n)
	case "resolve", "floor":
		return generatePlanes(path, j.n)
	}
	return nil
}

func (j job) cleanup(dir string) {
	os.Remove(j.input(dir))
	os.RemoveAll(filepath.Join(dir, "out"))
}

func (j job) args(dir string) []string {
	out := filepath.Join(dir, "out")
	switch j.kind {
	case "assess":
		return []string{"assess", "--example", "--out", out}
	case "sets":
		return []string{"sets", j.input(dir), "--out", out}
	case "floor":
		return []string{"-floor", j.input(dir) + "," + out}
	}
	return []string{"resolve", filepath.Join(dir, "site.yaml"), "--planes", j.input(dir), "--out", out, "--format", j.format}
}

// run runs exe with args and returns the wall time and the CPU time (user
// and system) in seconds and the peak resident memory in kilobytes.
// Standard output and error are kept apart from the terminal, so that no
// progress bar is drawn.
func run(exe string, args []string) (float64, float64, int64) {
	cmd := exec.Command(exe, args...)
	var errs bytes.Buffer
	cmd.Stderr = &errs
	t0 := time.Now()
	err := cmd.Run()
	el := time.Since(t0).Seconds()
	if err != nil {
		check(fmt.Errorf("%s %s: %v\n%s", filepath.Base(exe), strings.Join(args, " "), err, errs.Bytes()))
	}
	var kb int64
	if ru, ok := cmd.ProcessState.SysUsage().(*syscall.Rusage); ok {
		kb = ru.Maxrss // kilobytes on Linux
	}
	cpu := (cmd.ProcessState.UserTime() + cmd.ProcessState.SystemTime()).Seconds()
	return el, cpu, kb
}

func median(v []float64) float64 {
	s := slices.Clone(v)
	slices.Sort(s)
	if len(s)%2 == 1 {
		return s[len(s)/2]
	}
	return (s[len(s)/2-1] + s[len(s)/2]) / 2
}

func check(err error) {
	if err != nil {
		fmt.Fprintln(os.Stderr, "benchresolve:", err)
		os.Exit(1)
	}
}
