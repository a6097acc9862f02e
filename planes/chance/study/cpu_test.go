package study

import (
	"syscall"
	"testing"
	"time"
)

func cpuTime() time.Duration {
	var ru syscall.Rusage
	syscall.Getrusage(syscall.RUSAGE_SELF, &ru)
	return time.Duration(ru.Utime.Nano() + ru.Stime.Nano())
}

func TestCPUOfRun(t *testing.T) {
	if testing.Short() || !testing.Verbose() {
		t.Skip("a measurement, run with -v")
	}
	for _, fisher := range []bool{false, true} {
		a := benchSite(t, 1000, 20000, fisher)
		ts, _ := Targets(a)
		c0, w0 := cpuTime(), time.Now()
		if _, err := Run(a, ts, Options{}); err != nil {
			t.Fatal(err)
		}
		t.Logf("fisher %v: CPU %v, wall %v", fisher, cpuTime()-c0, time.Since(w0))
	}
}
