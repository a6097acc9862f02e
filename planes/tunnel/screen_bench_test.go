package tunnel_test

import (
	"runtime"
	"testing"

	"cleft/planes/assess"
	"cleft/planes/site"
	"cleft/planes/site/demo"
	"cleft/planes/tunnel"
)

var sinkScreening *tunnel.Screening

// demoInputs returns the demo site's tunnel, model and targets (57
// stations, 4 targets).
func demoInputs(b *testing.B) (*site.Site, []tunnel.Target) {
	s, err := site.ParseFS(demo.FS, demo.Site)
	if err != nil {
		b.Fatal(err)
	}
	a, err := assess.New(s)
	if err != nil {
		b.Fatal(err)
	}
	ts, err := a.Targets()
	if err != nil {
		b.Fatal(err)
	}
	return s, ts
}

// BenchmarkScreenDemo is the demo's whole tunnel screening with its slip
// zones (228 zone searches on the default grid), on all CPUs.
func BenchmarkScreenDemo(b *testing.B) {
	s, ts := demoInputs(b)
	for b.Loop() {
		sc, err := tunnel.Screen(*s.Tunnel, s.Model, ts)
		if err != nil {
			b.Fatal(err)
		}
		sinkScreening = sc
	}
}

// BenchmarkScreenDemoOneCPU is the same on one CPU.
func BenchmarkScreenDemoOneCPU(b *testing.B) {
	s, ts := demoInputs(b)
	defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(1))
	for b.Loop() {
		sc, err := tunnel.Screen(*s.Tunnel, s.Model, ts)
		if err != nil {
			b.Fatal(err)
		}
		sinkScreening = sc
	}
}

// BenchmarkScreenDemoNoZones is the demo's screening without the zones.
func BenchmarkScreenDemoNoZones(b *testing.B) {
	s, ts := demoInputs(b)
	t := *s.Tunnel
	t.NoZones = true
	for b.Loop() {
		sc, err := tunnel.Screen(t, s.Model, ts)
		if err != nil {
			b.Fatal(err)
		}
		sinkScreening = sc
	}
}
