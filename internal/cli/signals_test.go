package cli

import (
	"bytes"
	"context"
	"os"
	"strings"
	"sync"
	"syscall"
	"testing"
	"time"
)

// TestWatch: SIGINT and SIGTERM cancel the context, the record names the
// signal and the step under way, and stderr tells of it; a stopped watch
// cancels without a signal, named SIGINT as a cancelled run is.
func TestWatch(t *testing.T) {
	for _, c := range []struct {
		sig        syscall.Signal
		name       string
		terminated bool
	}{
		{syscall.SIGINT, "SIGINT", false},
		{syscall.SIGTERM, "SIGTERM", true},
	} {
		var stderr syncBuffer
		ctx, in, stop := Watch(context.Background(), &stderr, func() string { return "FORM" })
		// The handler is in place: the process signals itself and is not
		// killed.
		if err := syscall.Kill(os.Getpid(), c.sig); err != nil {
			t.Fatal(err)
		}
		select {
		case <-ctx.Done():
		case <-time.After(time.Minute):
			t.Fatalf("%s: the context was not cancelled", c.name)
		}
		stop()
		if in.Name() != c.name || in.Terminated() != c.terminated || in.During() != "FORM" {
			t.Errorf("%s: Name %q, Terminated %v, During %q", c.name, in.Name(), in.Terminated(), in.During())
		}
		if !strings.Contains(stderr.String(), "strutrisk: "+c.name+": stopping") {
			t.Errorf("%s: stderr %q does not tell of it", c.name, stderr.String())
		}
	}
	ctx, in, stop := Watch(context.Background(), &syncBuffer{}, func() string { return "x" })
	stop()
	if ctx.Err() == nil || in.Name() != "SIGINT" || in.Terminated() || in.During() != "" {
		t.Errorf("stopped without a signal: err %v, Name %q, During %q", ctx.Err(), in.Name(), in.During())
	}
}

// syncBuffer is a bytes.Buffer safe for the watcher's goroutine.
type syncBuffer struct {
	mu sync.Mutex
	b  bytes.Buffer
}

func (s *syncBuffer) Write(p []byte) (int, error) {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.b.Write(p)
}

func (s *syncBuffer) String() string {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.b.String()
}
