// Reading an input file (project, detail catalogue, schedule) whole, with the
// checks every reader needs before it reads: the path names a file, not a
// directory or a device, and the file is not larger than max_input_bytes.
//
// Every file read here is remembered by its identity (device and inode), so
// that an output naming the same file (under any name, through a symbolic or a
// hard link) is refused before anything is written (output_file.hpp).
#pragma once

#include <cstddef>
#include <cstdint>
#include <string>
#include <vector>

namespace pinproof {

// The largest input accepted: 512 MiB. No project, catalogue or schedule of a
// real building comes near it (a 100 000-beam schedule is about 10 MB); the
// limit keeps a wrong path (a disk image, /dev/zero) from exhausting memory.
inline constexpr std::uintmax_t max_input_bytes = 512ull * 1024 * 1024;

// The identity of a file: the same pair means the same file, whatever its name.
struct file_identity {
    std::uintmax_t device = 0;
    std::uintmax_t inode = 0;
    bool operator==(const file_identity& o) const { return device == o.device && inode == o.inode; }
};

// Reads the file at `path`. `what` names it in messages ("project file",
// "detail catalogue", "schedule"). Throws input_error at `path` when it does
// not exist, is a directory, a device or a socket, is larger than
// max_input_bytes, or cannot be read. A pipe (FIFO) is read up to the same limit.
std::string read_input_file(const std::string& path, const std::string& what);

// An input file read part by part (a schedule too large to hold whole), with
// the checks, the size limit and the identity record of read_input_file.
class input_file_stream {
public:
    input_file_stream(const std::string& path, const std::string& what);  // throws as read_input_file
    ~input_file_stream();
    input_file_stream(const input_file_stream&) = delete;
    input_file_stream& operator=(const input_file_stream&) = delete;

    // Appends at most `max` bytes to `text`; returns how many, 0 at the end of the file.
    std::size_t read_more(std::string& text, std::size_t max);
    std::uintmax_t size() const { return size_; }  // of a regular file; 0 for a pipe
    std::uintmax_t bytes_read() const { return read_; }

private:
    std::string path_, what_;
    int fd_ = -1;
    std::uintmax_t size_ = 0, read_ = 0;
};

// The identities of the files read by read_input_file in this process (since
// the last forget_input_files_read) that are still found under the name they
// were read by.
std::vector<file_identity> input_files_read();

// The files read in this run, in the order read: name, kind ("project file",
// ...) and size in bytes (for a --verbose account of the run).
struct input_read {
    std::string path, what;
    std::uintmax_t bytes = 0;
};
std::vector<input_read> input_files_log();

// Starts a new run: the files read before are no longer inputs.
void forget_input_files_read();

}  // namespace pinproof
