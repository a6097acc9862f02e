package main

import (
	"io"
	"os"
	"sync"
	"time"

	"github.com/schollz/progressbar/v3"
	"golang.org/x/term"
)

// progressDelay is how long a run goes before its progress bar shows:
// shorter runs draw nothing.
const progressDelay = time.Second

// progress is the progress bar of a long run on standard error. It is
// drawn only when standard error is a terminal, and only once the run has
// lasted progressDelay; a nil *progress draws nothing. Its methods may be
// called from any goroutine.
type progress struct {
	mu        sync.Mutex
	w         io.Writer
	bar       *progressbar.ProgressBar // nil until shown
	timer     *time.Timer
	stage     string
	done, max int // steps; max −1 while unknown
	finished  bool
}

// startProgress starts the bar for stderr, or returns nil when stderr is
// not a terminal.
func startProgress(stderr io.Writer) *progress {
	f, ok := stderr.(*os.File)
	if !ok || !term.IsTerminal(int(f.Fd())) {
		return nil
	}
	return newProgress(stderr, progressDelay)
}

// newProgress starts a bar on w that shows after delay.
func newProgress(w io.Writer, delay time.Duration) *progress {
	p := &progress{w: w, max: -1, stage: "reading"}
	p.timer = time.AfterFunc(delay, p.show)
	return p
}

func (p *progress) show() {
	p.mu.Lock()
	defer p.mu.Unlock()
	if p.finished || p.bar != nil {
		return
	}
	p.bar = progressbar.NewOptions(p.max,
		progressbar.OptionSetWriter(p.w),
		progressbar.OptionSetDescription(p.stage),
		progressbar.OptionSetWidth(30),
		progressbar.OptionShowCount(),
		progressbar.OptionSetPredictTime(false),
		progressbar.OptionSetElapsedTime(true),
		progressbar.OptionThrottle(100*time.Millisecond),
		progressbar.OptionClearOnFinish(),
	)
	p.bar.Set(p.done)
}

// set moves the bar to stage, done of max steps (max −1 when unknown).
func (p *progress) set(stage string, done, max int) {
	if p == nil {
		return
	}
	p.mu.Lock()
	defer p.mu.Unlock()
	if p.finished {
		return
	}
	changed := stage != p.stage || max != p.max
	p.stage, p.done, p.max = stage, done, max
	if p.bar == nil {
		return
	}
	if changed {
		p.bar.Describe(stage)
		p.bar.ChangeMax(max)
	}
	p.bar.Set(done)
}

// finish removes the bar (or keeps it from ever showing).
func (p *progress) finish() {
	if p == nil {
		return
	}
	p.timer.Stop()
	p.mu.Lock()
	defer p.mu.Unlock()
	if p.finished {
		return
	}
	p.finished = true
	if p.bar != nil {
		p.bar.Finish()
		p.bar.Clear()
	}
}

// report is a callback of done of total steps (study.Options.Progress).
func (p *progress) report(done, total int64) { p.set("resolving realisations", int(done), int(total)) }
