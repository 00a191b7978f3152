// Package cli holds what strutrisk's command line needs beyond its own
// wiring: the help texts of its commands, flags that may stand before or
// after the positional arguments, a context that SIGINT and SIGTERM
// cancel, and whether a writer is a terminal. It knows nothing of
// studies, estimates or results; cmd/strutrisk wires it to them.
package cli
