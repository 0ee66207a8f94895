#include "pinproof/core/input_file.hpp"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <algorithm>
#include <cerrno>
#include <cstring>
#include <mutex>

#include "pinproof/core/errors.hpp"

namespace pinproof {
namespace {

std::mutex registry_mutex;
struct file_read {
    file_identity id;
    std::string path;
    std::string what;
    std::uintmax_t bytes = 0;  // set when the whole file has been read
};
std::vector<file_read>& registry()
{
    static std::vector<file_read> files;
    return files;
}

file_identity identity_of(const struct stat& st)
{
    return {static_cast<std::uintmax_t>(st.st_dev), static_cast<std::uintmax_t>(st.st_ino)};
}

void remember(const struct stat& st, const std::string& path, const std::string& what)
{
    const file_identity id = identity_of(st);
    std::lock_guard<std::mutex> lock(registry_mutex);
    auto& files = registry();
    for (const auto& f : files)
        if (f.id == id && f.path == path) return;
    files.push_back({id, path, what, 0});
}

void note_bytes(const std::string& path, std::uintmax_t bytes)
{
    std::lock_guard<std::mutex> lock(registry_mutex);
    for (auto& f : registry())
        if (f.path == path) f.bytes = bytes;
}

std::string size_text(std::uintmax_t bytes)
{
    return std::to_string(bytes / (1024 * 1024)) + " MiB (" + std::to_string(bytes) + " bytes)";
}

// The kind of a file that is neither a regular file nor a pipe, for messages.
const char* kind_of(mode_t mode)
{
    if (S_ISDIR(mode)) return "a directory";
    if (S_ISCHR(mode)) return "a character device";
    if (S_ISBLK(mode)) return "a block device";
    if (S_ISSOCK(mode)) return "a socket";
    return "a special file";
}

class descriptor {
public:
    explicit descriptor(int fd) : fd_(fd) {}
    ~descriptor()
    {
        if (fd_ >= 0) ::close(fd_);
    }
    descriptor(const descriptor&) = delete;
    descriptor& operator=(const descriptor&) = delete;
    int get() const { return fd_; }
    int release()
    {
        const int fd = fd_;
        fd_ = -1;
        return fd;
    }

private:
    int fd_;
};

// Appends everything left on `fd` to `text`, held to max_input_bytes.
void read_to_end(int fd, const std::string& path, const std::string& what, std::string& text)
{
    char buf[1 << 16];
    for (;;) {
        const ssize_t n = ::read(fd, buf, sizeof buf);
        if (n == 0) break;
        if (n < 0) {
            if (errno == EINTR) continue;
            const int e = errno;
            throw input_error(path, "cannot read the " + what + ": " + std::strerror(e));
        }
        // A file that grows while it is read, or a pipe, is still held to the limit.
        if (text.size() + static_cast<std::size_t>(n) > max_input_bytes)
            throw input_error(path, "expected a " + what + " of at most 512 MiB, found more; the limit is " +
                                        size_text(max_input_bytes));
        text.append(buf, static_cast<std::size_t>(n));
    }
}

// Standard input can be read once: its text is kept for a second read of the
// same input (the report hashes the bytes its project was read from), and a
// second kind of input named "-" is refused.
struct standard_input_read {
    bool done = false;
    bool streamed = false;  // read part by part: its text was not kept
    std::string what, text;
};
standard_input_read& standard_input()
{
    static standard_input_read in;
    return in;
}

// Marks standard input as read as `what`, for a reader that streams it (its
// text is not kept); refuses it when it was read already.
void claim_standard_input(const std::string& what)
{
    std::lock_guard<std::mutex> lock(registry_mutex);
    auto& in = standard_input();
    if (in.done)
        throw input_error("-", "standard input can be read once, and it is already the " + in.what + "; give the " +
                                   what + " as a file");
    in.done = true;
    in.what = what;
    in.streamed = true;
    registry().push_back({file_identity{}, "-", what + " (standard input)", 0});
}

std::string read_standard_input(const std::string& what)
{
    std::lock_guard<std::mutex> lock(registry_mutex);
    auto& in = standard_input();
    if (in.done) {
        if (in.what == what && !in.streamed) return in.text;
        throw input_error("-", "standard input can be read once, and it is already the " + in.what +
                                   "; give the " + what + " as a file");
    }
    std::string text;
    read_to_end(STDIN_FILENO, "-", what, text);
    in.done = true;
    in.what = what;
    in.text = text;
    registry().push_back({file_identity{}, "-", what + " (standard input)", text.size()});
    return text;
}

}  // namespace

input_file_stream::input_file_stream(const std::string& path, const std::string& what) : path_(path), what_(what)
{
    if (path.empty()) throw input_error("(command line)", "expected the path of the " + what + ", found an empty name");
    if (path == "-") {
        claim_standard_input(what);
        fd_ = ::dup(STDIN_FILENO);
        if (fd_ < 0) {
            const int e = errno;
            throw input_error(path, "cannot read the " + what + " from standard input: " + std::strerror(e));
        }
        return;
    }
    // Look before opening: opening a FIFO with no writer would block, and a
    // directory opens fine on Linux.
    struct stat st {};
    if (::stat(path.c_str(), &st) != 0) {
        const int e = errno;
        throw input_error(path, "cannot open the " + what + " for reading: " + std::strerror(e));
    }
    if (!S_ISREG(st.st_mode) && !S_ISFIFO(st.st_mode))
        throw input_error(path, std::string("expected the ") + what + " as a file, found " + kind_of(st.st_mode));
    if (S_ISREG(st.st_mode) && static_cast<std::uintmax_t>(st.st_size) > max_input_bytes)
        throw input_error(path, "expected a " + what + " of at most 512 MiB, found " +
                                    size_text(static_cast<std::uintmax_t>(st.st_size)) + "; nothing was read");

    descriptor fd(::open(path.c_str(), O_RDONLY | O_CLOEXEC | O_NOCTTY));
    if (fd.get() < 0) {
        const int e = errno;
        throw input_error(path, "cannot open the " + what + " for reading: " + std::strerror(e));
    }
    // The file opened may differ from the one looked at (renamed in between):
    // judge the one actually read.
    struct stat opened {};
    if (::fstat(fd.get(), &opened) != 0 || (!S_ISREG(opened.st_mode) && !S_ISFIFO(opened.st_mode)))
        throw input_error(path, std::string("expected the ") + what + " as a file, found " + kind_of(opened.st_mode));
    remember(opened, path, what);
    if (S_ISREG(opened.st_mode)) size_ = static_cast<std::uintmax_t>(opened.st_size);
    fd_ = fd.release();
}

input_file_stream::~input_file_stream()
{
    if (fd_ >= 0) ::close(fd_);
}

std::size_t input_file_stream::read_more(std::string& text, std::size_t max)
{
    if (fd_ < 0) return 0;
    const std::size_t before = text.size();
    text.resize(before + max);
    for (;;) {
        const ssize_t n = ::read(fd_, text.data() + before, max);
        if (n < 0) {
            if (errno == EINTR) continue;
            const int e = errno;
            text.resize(before);
            throw input_error(path_, "cannot read the " + what_ + ": " + std::strerror(e));
        }
        text.resize(before + static_cast<std::size_t>(n));
        if (n == 0) {
            note_bytes(path_, read_);
            ::close(fd_);
            fd_ = -1;
            return 0;
        }
        // A file that grows while it is read, or a pipe, is still held to the limit.
        if (read_ + static_cast<std::size_t>(n) > max_input_bytes)
            throw input_error(path_, "expected a " + what_ + " of at most 512 MiB, found more; the limit is " +
                                         size_text(max_input_bytes));
        read_ += static_cast<std::size_t>(n);
        return static_cast<std::size_t>(n);
    }
}

std::string read_input_file(const std::string& path, const std::string& what)
{
    if (path == "-") return read_standard_input(what);
    input_file_stream in(path, what);
    std::string text;
    if (in.size() > 0) text.reserve(static_cast<std::size_t>(in.size()));
    while (in.read_more(text, 1 << 16) > 0) {
    }
    return text;
}

std::vector<input_read> input_files_log()
{
    std::lock_guard<std::mutex> lock(registry_mutex);
    std::vector<input_read> out;
    for (const auto& f : registry()) out.push_back({f.path, f.what, f.bytes});
    return out;
}

std::vector<file_identity> input_files_read()
{
    std::lock_guard<std::mutex> lock(registry_mutex);
    std::vector<file_identity> out;
    for (const auto& f : registry()) {
        if (f.path == "-") continue;  // standard input: no name to write to
        // A file deleted since may have given its inode to a new file: count
        // only those still found under the name they were read by.
        struct stat st {};
        if (::stat(f.path.c_str(), &st) == 0 && identity_of(st) == f.id) out.push_back(f.id);
    }
    return out;
}

void forget_input_files_read()
{
    std::lock_guard<std::mutex> lock(registry_mutex);
    registry().clear();
}

}  // namespace pinproof
