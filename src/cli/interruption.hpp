// Ending a run by a signal. SIGINT (Ctrl-C), SIGTERM (kill, a job scheduler)
// and SIGHUP (the terminal closed) end a run the same way: the temporaries of
// outputs being written are removed, no target is changed, and the exit code
// is 128 + the signal number, the shell's convention: 130 for SIGINT, 143 for
// SIGTERM, 129 for SIGHUP.
//
// While a command computes, a signal ends the run at once, unless the command
// has asked to stop cooperatively (batch: the workers stop after their current
// row, and the command reports how far it got).
#pragma once

#include <atomic>

namespace pinproof::cli {

inline constexpr int exit_sighup = 129;
inline constexpr int exit_sigint = 130;
inline constexpr int exit_sigterm = 143;

// Installs the handlers of SIGINT, SIGTERM and SIGHUP for its lifetime and
// restores the previous ones.
class interruption_guard {
public:
    interruption_guard();
    ~interruption_guard();
    interruption_guard(const interruption_guard&) = delete;
    interruption_guard& operator=(const interruption_guard&) = delete;
};

// While true, a signal only sets interruption_requested() and the run goes on
// to stop by itself; while false (the default), the handler ends the run.
void stop_cooperatively(bool on);

// Set by a signal; for the batch workers' cancel flag.
std::atomic<bool>& interruption_requested();

// The signal received (0: none) and its exit code.
int interruption_signal();
int interruption_exit_code();
const char* interruption_name();

}  // namespace pinproof::cli
