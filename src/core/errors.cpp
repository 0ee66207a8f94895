#include "pinproof/core/errors.hpp"

#include <algorithm>

namespace pinproof {
namespace {
std::string summary(const std::vector<input_problem>& problems)
{
    if (problems.empty()) return "invalid input";
    std::string s = problems.front().where + ": " + problems.front().message;
    if (problems.size() > 1) s += " (and " + std::to_string(problems.size() - 1) + " more)";
    return s;
}
}  // namespace

input_error::input_error(std::vector<input_problem> problems, std::size_t total)
    : error(summary(problems)), problems_(std::move(problems)), total_(std::max(total, problems_.size()))
{
}

input_error::input_error(std::string where, std::string message)
    : input_error(std::vector<input_problem>{{std::move(where), std::move(message)}})
{
}

// A file with millions of bad items must not produce millions of messages.
constexpr std::size_t max_problems_listed = 200;

void problem_list::add(std::string where, std::string message)
{
    ++count_;
    if (problems_.size() < max_problems_listed) problems_.push_back({std::move(where), std::move(message)});
}

void problem_list::add_all(const input_error& e)
{
    for (const auto& p : e.problems()) add(p.where, p.message);
}

void problem_list::throw_if_any() const
{
    if (problems_.empty()) return;
    auto listed = problems_;
    if (count_ > listed.size())
        listed.push_back({"(input)", "and " + std::to_string(count_ - listed.size()) +
                                         " more problems not listed; correct the ones above first"});
    throw input_error(listed, count_);
}

}  // namespace pinproof
