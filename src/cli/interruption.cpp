#include "interruption.hpp"

#include <unistd.h>

#include <cstring>

#include "pinproof/core/output_file.hpp"

// After the library headers: <csignal> defines the macro si_value.
#include <csignal>

namespace pinproof::cli {
namespace {

std::atomic<bool> requested{false};
std::atomic<bool> cooperative{false};
std::atomic<int> received{0};
std::atomic<std::size_t> commits_at_start{0};
static_assert(std::atomic<bool>::is_always_lock_free && std::atomic<int>::is_always_lock_free,
              "a signal handler reads these");

constexpr int handled[] = {SIGINT, SIGTERM, SIGHUP};

const char* name_of(int sig)
{
    switch (sig) {
    case SIGINT: return "SIGINT";
    case SIGTERM: return "SIGTERM";
    case SIGHUP: return "SIGHUP";
    default: return "a signal";
    }
}

void say(const char* text) { (void)!::write(STDERR_FILENO, text, std::strlen(text)); }

// Only async-signal-safe calls below: atomics, unlink (in
// remove_output_temporaries), write and _exit.
extern "C" void on_signal(int sig)
{
    received.store(sig);
    requested.store(true);
    if (cooperative.load()) return;
    remove_output_temporaries();
    say("\npinproof: interrupted by ");
    say(name_of(sig));
    if (completed_output_commits() != commits_at_start.load())
        say(" after the outputs of this run were written.\n");
    else
        say("; no output of this run was written (temporary files removed).\n");
    ::_exit(128 + sig);
}

struct sigaction previous[3];
bool installed[3] = {false, false, false};

}  // namespace

interruption_guard::interruption_guard()
{
    requested.store(false);
    cooperative.store(false);
    received.store(0);
    commits_at_start.store(completed_output_commits());
    for (int i = 0; i < 3; ++i) {
        struct sigaction sa {};
        sa.sa_handler = on_signal;
        sigemptyset(&sa.sa_mask);
        for (int s : handled) sigaddset(&sa.sa_mask, s);  // one handler at a time
        sa.sa_flags = 0;
        installed[i] = sigaction(handled[i], &sa, &previous[i]) == 0;
    }
}

interruption_guard::~interruption_guard()
{
    for (int i = 0; i < 3; ++i)
        if (installed[i]) sigaction(handled[i], &previous[i], nullptr);
    cooperative.store(false);
}

void stop_cooperatively(bool on)
{
    cooperative.store(on);
    // A signal that came just before cooperation ended must still end the run.
    if (!on && requested.load()) on_signal(received.load() ? received.load() : SIGINT);
}

std::atomic<bool>& interruption_requested() { return requested; }
int interruption_signal() { return received.load(); }
int interruption_exit_code() { return 128 + (received.load() ? received.load() : SIGINT); }
const char* interruption_name() { return name_of(received.load()); }

}  // namespace pinproof::cli
