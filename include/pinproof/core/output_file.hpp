// Writing result files so that a refused, failed or interrupted run never
// loses an input, never leaves a half-written file and never writes where it
// should not.
//
// All the outputs of one run form an output_set. commit() first checks every
// target, then writes each to a temporary file created exclusively beside its
// target (O_CREAT|O_EXCL|O_NOFOLLOW, an unpredictable name, mode 0666 less the
// umask, or the mode of the file it replaces), flushes each to the disk
// (fsync), and only when every one has been written renames them over their
// targets. A refusal or a failure before the renames leaves every target as it
// was and removes the temporaries.
//
// A target is refused (input_error naming the option, nothing written) when
//   - its name is empty;
//   - it is the same file as an input (same device and inode: also under
//     another name, through a symbolic link or a hard link);
//   - it exists and is not a regular file (a directory, a FIFO, a device, a
//     socket, or a symbolic link to one of these, or to nothing);
//   - it is a symbolic link owned by another user (a link planted in a shared
//     directory must not redirect the output);
//   - two outputs of the set name the same file.
#pragma once

#include <cstddef>
#include <cstdint>
#include <iosfwd>
#include <memory>
#include <string>
#include <string_view>
#include <vector>

namespace pinproof {

// Output too large to hold in memory (the summary of a batch of a million
// rows): an unnamed file, created beside the output it is for (in $TMPDIR or
// /tmp for standard output) and gone when closed or when the process ends,
// however it ends; an output_set copies it into place.
class scratch_file {
public:
    explicit scratch_file(const std::string& target);  // throws error when it cannot be created
    ~scratch_file();
    scratch_file(const scratch_file&) = delete;
    scratch_file& operator=(const scratch_file&) = delete;

    void append(std::string_view text);  // buffered; throws error (disk full)
    void clear();                        // forgets everything appended
    std::uintmax_t size() const { return written_ + buffer_.size(); }
    // Every byte appended, to a file descriptor (`shown` names it in errors) or a stream.
    void copy_to(int fd, const std::string& shown);
    void copy_to(std::ostream& out);

private:
    static constexpr std::size_t buffer_bytes = std::size_t{1} << 20;
    int fd_ = -1;
    std::string buffer_, shown_;
    std::uintmax_t written_ = 0;
    void flush();
};

class output_set {
public:
    // `option` names the output in messages ("--json", "-o"); "-" is not a file
    // and must be handled by the caller.
    void add(std::string option, std::string path, std::string content);
    // Content held in a scratch file: `head`, the scratch file's bytes, `tail`.
    void add(std::string option, std::string path, std::string head, std::shared_ptr<scratch_file> body,
             std::string tail);

    // Inputs named by the caller, compared by identity in addition to every
    // file read by read_input_file (input_file.hpp).
    void add_input(std::string path);

    // Throws input_error for a refused target, pinproof::error for a failed
    // write (disk full, no permission); in both cases no target has changed.
    void commit();

    // Runs the checks of commit() without writing anything, so that a run can
    // refuse its outputs before it spends time computing them.
    void check() const;

    bool empty() const { return outputs_.empty(); }

private:
    struct output {
        std::string option, path, content;
        std::shared_ptr<scratch_file> body;  // between content and tail, when set
        std::string tail;
    };
    std::vector<output> outputs_;
    std::vector<std::string> inputs_;
};

// Writes one file through an output_set of one.
void write_file_atomically(const std::string& path, const std::string& content);

// For signal handlers (async-signal-safe): removes the temporary files of the
// outputs being written at this moment. The renames of a commit run with
// SIGINT, SIGTERM and SIGHUP blocked, so a signal sees either every target
// unchanged or every target replaced.
void remove_output_temporaries() noexcept;

// How many commits have finished renaming in this process (async-signal-safe),
// so that a signal handler can tell whether the run's outputs are in place.
std::size_t completed_output_commits() noexcept;

}  // namespace pinproof
