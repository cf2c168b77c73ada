package org.shutline.cli;

public final class Main {
    public static void main(String[] args) {
        System.out.println("shutline");
    }
}
