package main

import (
	"io"
	"os"
	"time"

	"github.com/schollz/progressbar/v3"
	"golang.org/x/term"
)

// progress is a progress bar on standard error for runs longer than a
// second, shown only when standard error is a terminal.
type progress struct {
	w     io.Writer
	tty   bool
	start time.Time
	bar   *progressbar.ProgressBar
}

func newProgress(w io.Writer) *progress {
	f, ok := w.(*os.File)
	return &progress{w: w, tty: ok && term.IsTerminal(int(f.Fd())), start: time.Now()}
}

// report is the callback of study.Options.Progress.
func (p *progress) report(done, total int64) {
	if !p.tty {
		return
	}
	if p.bar == nil {
		if time.Since(p.start) < time.Second {
			return
		}
		p.bar = progressbar.NewOptions64(total,
			progressbar.OptionSetWriter(p.w),
			progressbar.OptionSetDescription("resolving realisations"),
			progressbar.OptionThrottle(100*time.Millisecond),
			progressbar.OptionShowCount(),
			progressbar.OptionClearOnFinish(),
			progressbar.OptionSetPredictTime(true))
	}
	_ = p.bar.Set64(done)
}

// finish clears the bar, if one was shown.
func (p *progress) finish() {
	if p.bar != nil {
		_ = p.bar.Finish()
	}
}
