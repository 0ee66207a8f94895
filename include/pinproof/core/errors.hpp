// Error types of the library.
//
// input_error   : the user's input is wrong. Carries every problem found, each
//                 with the place it was found (a JSON pointer such as
//                 "/beams/2/loads/0/at", or "line 4, column 3" for CSV) and a
//                 message saying what was expected and what was found.
// internal_error: the engine found one of its own invariants broken (for
//                 example an equilibrium residual). Never a user mistake.
#pragma once

#include <stdexcept>
#include <string>
#include <vector>

namespace pinproof {

class error : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

struct input_problem {
    std::string where;    // JSON pointer or "line L, column C"
    std::string message;  // "expected ..., found ..."
};

class input_error : public error {
public:
    explicit input_error(std::vector<input_problem> problems, std::size_t total = 0);
    input_error(std::string where, std::string message);
    const std::vector<input_problem>& problems() const noexcept { return problems_; }
    // How many problems were found; more than problems().size() when the list was cut short.
    std::size_t total() const noexcept { return total_; }

private:
    std::vector<input_problem> problems_;
    std::size_t total_ = 0;
};

class internal_error : public error {
public:
    using error::error;
};

// Collects input problems so that one run reports all of them.
class problem_list {
public:
    void add(std::string where, std::string message);
    void add_all(const input_error& e);
    bool empty() const noexcept { return count_ == 0; }
    // Every problem added, including those beyond the 200 that are kept.
    std::size_t size() const noexcept { return count_; }
    const std::vector<input_problem>& problems() const noexcept { return problems_; }
    // Throws input_error carrying every problem, if there is at least one.
    void throw_if_any() const;

private:
    std::vector<input_problem> problems_;
    std::size_t count_ = 0;
};

}  // namespace pinproof
