// Command benchchance measures the Monte Carlo of cleft chance: 20,000
// realisations × 1,000 planes (2·10⁷ resolutions) of the uncertainty in
// issue 12's example (seven inputs, one rank correlation; and again with
// Fisher scatter of the poles), in process, best of -runs, wall and CPU
// time; then the same sampling and resolution vectorised with numpy
// (chance_numpy.py beside this file), skipped with a message when no
// Python with numpy is found. It is a benchmark script, not a test: run it
// by hand from the repository root,
//
//	go run ./cmd/benchchance
package main

import (
	"flag"
	"fmt"
	"math/rand/v2"
	"os"
	"os/exec"
	"path/filepath"
	"runtime"
	"strconv"
	"strings"
	"syscall"
	"time"

	"cleft/planes/assess"
	"cleft/planes/chance/study"
	"cleft/planes/site"
)

func main() {
	planes := flag.Int("planes", 1000, "number of planes")
	n := flag.Int("realisations", 20000, "number of realisations")
	runs := flag.Int("runs", 3, "runs of each; the best is reported")
	flag.Parse()
	dir, err := os.MkdirTemp("", "cleft-benchchance-")
	check(err)
	defer os.RemoveAll(dir)
	table := filepath.Join(dir, "planes.csv")
	var b, csv strings.Builder
	csv.WriteString("name,dip,dip_direction,depth,friction\n")
	rng := rand.New(rand.NewPCG(1, 2))
	for i := range *planes {
		name := fmt.Sprintf("P%d", i)
		if i == 0 {
			name = "F1"
		}
		fmt.Fprintf(&b, "  - {name: %s, dip: %.1f, dip_direction: %.1f, depth: %.1f}\n", name, 90*rng.Float64(), 360*rng.Float64(), 50+450*rng.Float64())
	}
	for _, l := range strings.Split(strings.TrimSpace(b.String()), "\n") {
		var name string
		var dip, dd, z float64
		fmt.Sscanf(strings.NewReplacer("{", "", "}", "", ",", "", "name:", "", "dip:", "", "dip_direction:", "", "depth:", "", "-", "").Replace(l), "%s %g %g %g", &name, &dip, &dd, &z)
		fmt.Fprintf(&csv, "%s,%g,%g,%g,\n", name, dip, dd, z)
	}
	check(os.WriteFile(table, []byte(csv.String()), 0o644))
	fmt.Printf("%d realisations × %d planes = %.3g resolutions, GOMAXPROCS %d\n\n", *n, *planes, float64(*n)*float64(*planes), runtime.GOMAXPROCS(0))
	fmt.Printf("%-28s %10s %10s\n", "", "best wall s", "its CPU s")
	type times struct{ wall, cpu time.Duration }
	best := map[bool]times{}
	for _, fisher := range []bool{false, true} {
		s, err := site.Parse([]byte(siteYAML(b.String(), *n, fisher)), "bench.yaml")
		check(err)
		a, err := assess.New(s)
		check(err)
		ts, err := study.Targets(a)
		check(err)
		w, c := time.Duration(1<<62), time.Duration(0)
		for range *runs {
			c0, w0 := cpu(), time.Now()
			_, err := study.Run(a, ts, study.Options{})
			check(err)
			if el := time.Since(w0); el < w {
				w, c = el, cpu()-c0
			}
		}
		best[fisher] = times{w, c}
		fmt.Printf("%-28s %10.3f %10.3f\n", label("cleft (Go)", fisher), w.Seconds(), c.Seconds())
	}
	py := numpyPython()
	if py == "" {
		fmt.Println("\nnumpy: skipped (no python3 with numpy; apt-get install -y python3-numpy)")
		return
	}
	script := filepath.Join("cmd", "benchchance", "chance_numpy.py")
	for _, fisher := range []bool{false, true} {
		args := []string{script, table, strconv.Itoa(*n)}
		if fisher {
			args = append(args, "--fisher", "200")
		}
		w, c := time.Duration(1<<62), time.Duration(0)
		for range *runs {
			out, err := exec.Command(py, args...).Output()
			if err != nil {
				fmt.Printf("numpy: %v: %s\n", err, out)
				return
			}
			f := strings.Fields(string(out))
			if len(f) != 2 {
				fmt.Printf("numpy: unexpected output %q\n", out)
				return
			}
			ws, err1 := strconv.ParseFloat(f[0], 64)
			cs, err2 := strconv.ParseFloat(f[1], 64)
			check(err1)
			check(err2)
			if d := time.Duration(ws * 1e9); d < w {
				w, c = d, time.Duration(cs*1e9)
			}
		}
		g := best[fisher]
		fmt.Printf("%-28s %10.3f %10.3f   cleft faster by %.1f× (wall), %.1f× (CPU)\n", label("numpy", fisher), w.Seconds(), c.Seconds(), w.Seconds()/g.wall.Seconds(), c.Seconds()/g.cpu.Seconds())
	}
}

func label(s string, fisher bool) string {
	if fisher {
		return s + ", Fisher κ 200"
	}
	return s
}

// numpyPython returns a Python that imports numpy, or "".
func numpyPython() string {
	for _, p := range []string{"python3", "/usr/bin/python3"} {
		if exec.Command(p, "-c", "import numpy").Run() == nil {
			return p
		}
	}
	return ""
}

func siteYAML(planes string, n int, fisher bool) string {
	y := `site: benchmark (generated)
stress:
  vertical: {density: 2650}
  shmax: {ratio: 1.35, azimuth: 128}
  shmin: {ratio: 0.72}
water: {table: 18}
strength: {friction: 0.6}
planes:
` + planes + fmt.Sprintf(`uncertainty:
  realisations: %d
  seed: 7
  vary:
    stress.shmax.ratio:   {normal: [1.35, 0.15]}
    stress.shmax.azimuth: {uniform: [110, 146]}
    stress.shmin.ratio:   {triangular: [0.6, 0.72, 0.85]}
    stress.vertical.density: {normal: [2650, 50], min: 2400, max: 2900}
    water.table:          {uniform: [5, 30]}
    strength.friction:    {lognormal: [0.6, 0.1]}
    planes.F1.friction:   {uniform: [0.35, 0.5]}
  correlations: [[stress.shmax.ratio, stress.shmin.ratio, 0.7]]
`, n)
	if fisher {
		y += "  orientation: {fisher_k: 200}\n"
	}
	return y
}

func cpu() time.Duration {
	var ru syscall.Rusage
	syscall.Getrusage(syscall.RUSAGE_SELF, &ru)
	return time.Duration(ru.Utime.Nano() + ru.Stime.Nano())
}

func check(err error) {
	if err != nil {
		fmt.Fprintln(os.Stderr, "benchchance:", err)
		os.Exit(1)
	}
}
