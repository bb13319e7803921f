"""placeholder"""
def main() -> None:
    pass
